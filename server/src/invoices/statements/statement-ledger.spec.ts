import { buildStatement, type LedgerEntry } from './statement-ledger';

const entry = (kind: LedgerEntry['kind'], day: string, cents: number, at = 0): LedgerEntry => {
  const charge = kind === 'invoice' || kind === 'refund';
  return {
    kind,
    day,
    description: `${kind} ${day}`,
    chargeCents: charge ? cents : 0,
    creditCents: charge ? 0 : cents,
    at,
  };
};

describe('buildStatement', () => {
  const entries = [
    entry('invoice', '2026-11-10', 9255),
    entry('payment', '2026-11-20', 5000),
    // Listed out of order on purpose: the statement sorts by day, then invoice before payment before credit.
    entry('credit-note', '2026-12-05', 1000),
    entry('payment', '2026-12-05', 2000),
    entry('invoice', '2026-12-05', 4830),
    entry('refund', '2026-12-06', 1000),
    entry('invoice', '2027-01-02', 7000),
  ];

  it('opens with everything before the period and closes with the period added', () => {
    const sut = buildStatement(entries, '2026-12-01', '2026-12-31');
    expect(sut.openingCents).toBe(9255 - 5000);
    expect(sut.closingCents).toBe(9255 - 5000 + 4830 - 2000 - 1000 + 1000);
    expect(sut.rows.map((r) => r.kind)).toEqual(['invoice', 'payment', 'credit-note', 'refund']);
  });

  it('carries a running balance that ends at the closing balance', () => {
    const sut = buildStatement(entries, '2026-12-01', '2026-12-31');
    expect(sut.rows.map((r) => r.balanceCents)).toEqual([9085, 7085, 6085, 7085]);
    expect(sut.rows.at(-1)!.balanceCents).toBe(sut.closingCents);
  });

  it('adds up each kind over the period only', () => {
    expect(buildStatement(entries, '2026-12-01', '2026-12-31').totals).toEqual({
      invoicedCents: 4830,
      refundedCents: 1000,
      paidCents: 2000,
      creditedCents: 1000,
      voidedCents: 0,
    });
  });

  it('orders same-day entries of one kind by when they were recorded', () => {
    const sut = buildStatement(
      [entry('payment', '2026-12-05', 100, 2), entry('payment', '2026-12-05', 200, 1)],
      '2026-12-01',
      '2026-12-31',
    );
    expect(sut.rows.map((r) => r.creditCents)).toEqual([200, 100]);
  });

  it('nets a void against its invoice', () => {
    const sut = buildStatement(
      [entry('invoice', '2026-12-02', 4830), entry('void', '2026-12-03', 4830)],
      '2026-12-01',
      '2026-12-31',
    );
    expect(sut.closingCents).toBe(0);
    expect(sut.totals.voidedCents).toBe(4830);
  });

  it('is empty with the opening balance carried through when nothing happened in the period', () => {
    const sut = buildStatement(entries, '2026-12-10', '2026-12-20');
    expect(sut.rows).toEqual([]);
    expect(sut.closingCents).toBe(sut.openingCents);
  });
});

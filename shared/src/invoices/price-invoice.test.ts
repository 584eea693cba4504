import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isRuleError } from '../errors.js';
import { DEMO_RATE_CARD } from '../rates/demo-rate-card.js';
import { priceTicket } from '../rates/price-ticket.js';
import { EDGE_TYPES, HANDEDNESS, SHEAR_USES, TOOL_KINDS, type Shear } from '../shears.js';
import { invoiceLinesFromTicket } from './invoice-lines.js';
import { priceInvoice, spreadCents, type InvoiceLineInput } from './price-invoice.js';

const taxed = (amountCents: number, taxRateBp = 825): InvoiceLineInput => ({ amountCents, taxable: true, taxRateBp });

describe('priceInvoice', () => {
  it('takes tax once on the invoice, half-up to the cent (worked example)', () => {
    // 3 lines at 8.25 %: 42.00 + 18.00 + 7.35 = 67.35; 67.35 × 0.0825 = 5.556375 → 5.56 (half-up on the invoice,
    // PRODUCT.md "rounding half-up to the cent on each invoice's tax"). Per line it would be 3.47 + 1.49 + 0.61 = 5.57.
    const price = priceInvoice([taxed(4200), taxed(1800), taxed(735)], null);
    expect(price).toMatchObject({ linesCents: 6735, discountCents: 0, subtotalCents: 6735, taxCents: 556 });
    expect(price.totalCents).toBe(7291);
    expect(price.taxGroups).toEqual([{ taxRateBp: 825, taxableCents: 6735, taxCents: 556 }]);
    expect(price.summary).toEqual(['tax 8.25% on $67.35 = $5.56']);
  });

  it('rounds an exact half cent up: 10.00 at 0.05 % is 0.005 → 0.01', () => {
    expect(priceInvoice([taxed(1000, 5)], null).taxCents).toBe(1);
  });

  it('takes a share discount before tax (worked example)', () => {
    // 10 % off 120.00 = 12.00; 108.00 × 7 % = 7.56; total 115.56.
    const price = priceInvoice([taxed(12000, 700)], { discountBp: 1000 });
    expect(price).toMatchObject({ discountCents: 1200, subtotalCents: 10800, taxCents: 756, totalCents: 11556 });
    expect(price.summary[0]).toBe('10% off $120.00 = −$12.00');
  });

  it('spreads an amount discount over the tax groups and the untaxed lines in proportion, exact to the cent', () => {
    // Weights 60.00 (5 %), 30.00 (8 %), 10.00 untaxed; 10.00 off → 6.00, 3.00, 1.00.
    const price = priceInvoice(
      [taxed(6000, 500), taxed(3000, 800), { amountCents: 1000, taxable: false, taxRateBp: 0 }],
      { discountCents: 1000 },
    );
    expect(price.taxGroups).toEqual([
      { taxRateBp: 500, taxableCents: 5400, taxCents: 270 },
      { taxRateBp: 800, taxableCents: 2700, taxCents: 216 },
    ]);
    expect(price.totalCents).toBe(9000 + 270 + 216);
    expect(price.summary).toContain('not taxed: $9.00');
  });

  it('counts a ticket discount line (negative) in its group', () => {
    const price = priceInvoice([taxed(5000), taxed(-500)], null);
    expect(price.taxGroups[0]).toEqual({ taxRateBp: 825, taxableCents: 4500, taxCents: 371 });
  });

  it('refuses what cannot be an invoice, naming the field', () => {
    const refused = (run: () => unknown) => {
      try {
        run();
      } catch (error) {
        return isRuleError(error) ? error.field : 'not a rule error';
      }
      return 'accepted';
    };
    expect(refused(() => priceInvoice([], null))).toBe('lines');
    expect(refused(() => priceInvoice([taxed(100)], { discountCents: 101 }))).toBe('discountCents');
    expect(refused(() => priceInvoice([taxed(100)], { discountBp: 10001 }))).toBe('discountBp');
    expect(refused(() => priceInvoice([taxed(100)], { discountBp: 1, discountCents: 1 }))).toBe('discount');
    expect(refused(() => priceInvoice([taxed(1.5)], null))).toBe('lines[0].amountCents');
    expect(refused(() => priceInvoice([taxed(100, -1)], null))).toBe('lines[0].taxRateBp');
    expect(refused(() => priceInvoice([{ amountCents: 1, taxable: 'yes' } as never], null))).toBe('lines[0].taxable');
    expect(refused(() => priceInvoice([taxed(100), taxed(-200)], null))).toBe('lines');
  });
});

describe('spreadCents', () => {
  it('is the largest remainder (Hamilton) split: floor or ceiling of each exact quota, summing to the total', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 1_000_000 }),
        fc.array(fc.integer({ min: 0, max: 100_000 }), { minLength: 1, maxLength: 6 }),
        (total, weights) => {
          const whole = weights.reduce((a, b) => a + b, 0);
          const shares = spreadCents(total, weights);
          if (whole === 0) return expect(shares.every((share) => share === 0)).toBe(true);
          expect(shares.reduce((a, b) => a + b, 0)).toBe(total);
          const quota = weights.map((weight) => (total * weight) / whole);
          shares.forEach((share, i) => expect([Math.floor(quota[i]!), Math.ceil(quota[i]!)]).toContain(share));
          // Every share rounded up had a remainder at least as large as every share rounded down.
          const remainder = (i: number) => quota[i]! - Math.floor(quota[i]!);
          const up = shares.flatMap((share, i) => (share > Math.floor(quota[i]!) ? [remainder(i)] : []));
          const down = shares.flatMap((share, i) =>
            share === Math.floor(quota[i]!) && remainder(i) > 0 ? [remainder(i)] : [],
          );
          if (up.length > 0 && down.length > 0) expect(Math.min(...up)).toBeGreaterThanOrEqual(Math.max(...down));
        },
      ),
    );
  });

  it('splits 1.00 over three equal weights as 34, 33, 33 (ties to the earlier weight)', () => {
    expect(spreadCents(100, [1, 1, 1])).toEqual([34, 33, 33]);
  });
});

const shearArb: fc.Arbitrary<Shear> = fc.record({
  edgeType: fc.constantFrom(...EDGE_TYPES),
  toolKind: fc.constantFrom(...TOOL_KINDS),
  lengthIn: fc.integer({ min: 16, max: 36 }).map((quarters) => quarters / 4),
  handedness: fc.constantFrom(...HANDEDNESS),
  use: fc.constantFrom(...SHEAR_USES),
});

describe('an invoice of one ticket', () => {
  it('totals what priceTicket totals, to the cent, with the ticket discount, minimum and trip charge on one line', () => {
    fc.assert(
      fc.property(
        fc.array(shearArb, { minLength: 1, maxLength: 8 }),
        fc.integer({ min: 0, max: 1500 }),
        fc.boolean(),
        fc.boolean(),
        (shears, taxRateBp, chargeTrip, servicesTaxable) => {
          const card = { ...DEMO_RATE_CARD, servicesTaxable };
          const ticket = priceTicket(
            shears.map((shear) => ({ shear })),
            card,
            { taxRateBp, chargeTrip },
          );
          const lines = invoiceLinesFromTicket({
            label: 'Ticket (generated)',
            lines: ticket.lines.map((line, index) => ({
              ticketLineId: `line-${index}`,
              description: line.explanation,
              amountCents: line.totalCents,
            })),
            subtotalCents: ticket.subtotalCents,
            taxRateBp,
            servicesTaxable,
            adjustmentLabel: ticket.summary.slice(0, -1).join('; '),
          });
          const invoice = priceInvoice(lines, null);
          expect(invoice.subtotalCents).toBe(ticket.subtotalCents);
          expect(invoice.taxCents).toBe(ticket.taxCents);
          expect(invoice.totalCents).toBe(ticket.totalCents);
        },
      ),
    );
  });
});

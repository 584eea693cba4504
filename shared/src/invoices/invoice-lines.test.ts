import { describe, expect, it } from 'vitest';
import { invoiceLinesFromTicket, type TicketForInvoice } from './invoice-lines.js';
import { dueDate } from './due-date.js';

const ticket = (overrides: Partial<TicketForInvoice> = {}): TicketForInvoice => ({
  label: 'Ticket 2026-12-03, Pine Street Salon (invented)',
  lines: [
    { ticketLineId: 'a', description: 'KR-000101 beveled straight shear', amountCents: 3800 },
    { ticketLineId: 'b', description: 'KR-000102 convex straight shear', amountCents: 4200 },
  ],
  subtotalCents: 8700,
  taxRateBp: 825,
  servicesTaxable: true,
  adjustmentLabel: 'trip charge for the stop visit: + $7.00',
  ...overrides,
});

describe('invoiceLinesFromTicket', () => {
  it('adds one adjustment line for what the ticket itself added, so the lines sum to its subtotal', () => {
    const lines = invoiceLinesFromTicket(ticket());
    expect(lines.map((line) => [line.kind, line.amountCents])).toEqual([
      ['shear', 3800],
      ['shear', 4200],
      ['adjustment', 700],
    ]);
    expect(lines[2]!.description).toBe(
      'Ticket 2026-12-03, Pine Street Salon (invented): trip charge for the stop visit: + $7.00',
    );
    expect(lines.every((line) => line.taxable && line.taxRateBp === 825)).toBe(true);
  });

  it('leaves the adjustment out when there is none, and carries a ticket discount as a negative line', () => {
    expect(invoiceLinesFromTicket(ticket({ subtotalCents: 8000 }))).toHaveLength(2);
    expect(invoiceLinesFromTicket(ticket({ subtotalCents: 7600 })).at(-1)!.amountCents).toBe(-400);
  });

  it('marks the lines untaxed when the services are not taxed, and refuses broken input', () => {
    expect(invoiceLinesFromTicket(ticket({ servicesTaxable: false }))[0]!.taxable).toBe(false);
    expect(() => invoiceLinesFromTicket(ticket({ taxRateBp: -5 }))).toThrow(/Tax rate/);
    expect(() => invoiceLinesFromTicket(ticket({ lines: null as never }))).toThrow(/lines/);
    expect(() => invoiceLinesFromTicket(ticket({ subtotalCents: 1.5 }))).toThrow(/whole number/);
  });
});

describe('dueDate', () => {
  it('adds calendar days across month and year ends and leap days', () => {
    expect(dueDate('2026-12-02', 14)).toBe('2026-12-16');
    expect(dueDate('2026-12-20', 14)).toBe('2027-01-03');
    expect(dueDate('2028-02-28', 1)).toBe('2028-02-29');
    expect(dueDate('2027-02-28', 1)).toBe('2027-03-01');
    expect(dueDate('2026-01-31', 0)).toBe('2026-01-31');
  });

  it('refuses a date that is not one, and terms out of range', () => {
    expect(() => dueDate('2026-02-30', 1)).toThrow(/YYYY-MM-DD/);
    expect(() => dueDate('02/12/2026', 1)).toThrow(/YYYY-MM-DD/);
    expect(() => dueDate(undefined as never, 1)).toThrow(/YYYY-MM-DD/);
    expect(() => dueDate('2026-12-02', -1)).toThrow(/Payment terms/);
    expect(() => dueDate('2026-12-02', 1.5)).toThrow(/Payment terms/);
  });
});

import { describe, expect, it } from 'vitest';
import { invoiceLinesFromTicket, type TicketForInvoice } from './invoice-lines.js';

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
    expect(() => invoiceLinesFromTicket(ticket({ subtotalCents: -100 }))).toThrow(/subtotalCents must be between 0/);
    expect(() => invoiceLinesFromTicket(ticket({ label: ' ' }))).toThrow(/label must be a non-empty text/);
    expect(() => invoiceLinesFromTicket(ticket({ servicesTaxable: 'yes' as never }))).toThrow(/taxed/);
    const noId = [{ ticketLineId: undefined as never, description: 'x', amountCents: 1 }];
    expect(() => invoiceLinesFromTicket(ticket({ lines: noId }))).toThrow(/lines\[0\]\.ticketLineId/);
    const negative = [{ ticketLineId: 'a', description: 'x', amountCents: -1 }];
    expect(() => invoiceLinesFromTicket(ticket({ lines: negative }))).toThrow(/lines\[0\]\.amountCents/);
  });

  it('needs the adjustment label only when there is an adjustment', () => {
    expect(invoiceLinesFromTicket(ticket({ subtotalCents: 8000, adjustmentLabel: '' }))).toHaveLength(2);
    expect(() => invoiceLinesFromTicket(ticket({ adjustmentLabel: '' }))).toThrow(/adjustmentLabel/);
  });
});

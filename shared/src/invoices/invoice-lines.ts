import { RuleError } from '../errors.js';
import { assertCents, sumCents, validateTaxRateBp, type Cents } from '../money.js';

/** What a finished ticket brings to an invoice: its shear lines at their effective price and its totals. */
export interface TicketForInvoice {
  /** e.g. "Ticket 2026-12-03, Pine Street Salon"; starts every line's description. */
  label: string;
  lines: { ticketLineId: string; description: string; amountCents: Cents }[];
  /** The ticket's subtotal after its own discount, minimum, trip charge and overrides. */
  subtotalCents: Cents;
  taxRateBp: number;
  servicesTaxable: boolean;
  /** The ticket's discount, minimum and trip charge in words. */
  adjustmentLabel: string;
}

export interface InvoiceLineDraft {
  kind: 'shear' | 'adjustment';
  ticketLineId: string | null;
  description: string;
  amountCents: Cents;
  taxable: boolean;
  taxRateBp: number;
}

/**
 * A ticket's lines on an invoice: one per shear, plus one adjustment line for what the ticket itself added or took off
 * (its multi-pair discount, minimum top-up and trip charge), so the lines add up to the ticket's subtotal exactly.
 */
export function invoiceLinesFromTicket(ticket: TicketForInvoice): InvoiceLineDraft[] {
  const taxRateBp = validateTaxRateBp(ticket.taxRateBp, 'taxRateBp');
  const subtotal = assertCents(ticket.subtotalCents, 'subtotalCents');
  if (!Array.isArray(ticket.lines)) throw new RuleError('invalid-invoice', 'A ticket needs its lines.', 'lines');
  const shearLines = ticket.lines.map((line, index): InvoiceLineDraft => ({
    kind: 'shear',
    ticketLineId: line.ticketLineId,
    description: `${ticket.label}: ${line.description}`,
    amountCents: assertCents(line.amountCents, `lines[${index}].amountCents`),
    taxable: ticket.servicesTaxable,
    taxRateBp,
  }));
  const adjustment = subtotal - sumCents(shearLines.map((line) => line.amountCents));
  if (adjustment === 0) return shearLines;
  return [
    ...shearLines,
    {
      kind: 'adjustment',
      ticketLineId: null,
      description: `${ticket.label}: ${ticket.adjustmentLabel}`,
      amountCents: adjustment,
      taxable: ticket.servicesTaxable,
      taxRateBp,
    },
  ];
}

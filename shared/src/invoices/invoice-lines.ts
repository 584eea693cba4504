import { RuleError, shown } from '../errors.js';
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
  const label = text(ticket?.label, 'label');
  const taxRateBp = validateTaxRateBp(ticket.taxRateBp, 'taxRateBp');
  const subtotal = assertCents(ticket.subtotalCents, 'subtotalCents');
  if (typeof ticket.servicesTaxable !== 'boolean') {
    throw new RuleError('invalid-invoice', "Say whether the ticket's services are taxed.", 'servicesTaxable');
  }
  const taxable = ticket.servicesTaxable;
  const untrustedLines: unknown = ticket.lines;
  if (!Array.isArray(untrustedLines)) throw new RuleError('invalid-invoice', 'A ticket needs its lines.', 'lines');
  const shearLines = ticket.lines.map((line, index): InvoiceLineDraft => {
    const at = `lines[${index}]`;
    return {
      kind: 'shear',
      ticketLineId: text(line?.ticketLineId, `${at}.ticketLineId`),
      description: `${label}: ${text(line.description, `${at}.description`)}`,
      amountCents: assertCents(line.amountCents, `${at}.amountCents`),
      taxable,
      taxRateBp,
    };
  });
  // What the ticket added or took off beyond its shears: its multi-pair discount, minimum top-up and trip charge.
  const adjustment = subtotal - sumCents(shearLines.map((line) => line.amountCents));
  if (adjustment === 0) return shearLines;
  const adjustmentLabel = text(ticket.adjustmentLabel, 'adjustmentLabel');
  return [
    ...shearLines,
    {
      kind: 'adjustment',
      ticketLineId: null,
      description: `${label}: ${adjustmentLabel}`,
      amountCents: adjustment,
      taxable,
      taxRateBp,
    },
  ];
}

function text(value: unknown, field: string): string {
  if (typeof value !== 'string' || value.trim() === '') {
    throw new RuleError('invalid-invoice', `${field} must be a non-empty text; got ${shown(value)}.`, field);
  }
  return value.trim();
}

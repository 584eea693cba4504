import { formatMoney } from '@keenroute/shared';
import { DomainError } from '../../common/errors/domain-error';
import type { Settlement, TicketStatus } from '../entities/ticket.entity';
import type { ManualPaymentMethod } from '../../payments/entities/payment.entity';

export const paidCents = (payments: readonly { amountCents: number }[]) =>
  payments.reduce((sum, payment) => sum + payment.amountCents, 0);

export interface PayableTicket {
  status: TicketStatus;
  settlement: Settlement;
  totalCents: number;
  currency: string;
}

/**
 * Whether a payment can be taken, and the settlement after it. Money is taken once the pairs are done (the price is
 * final), never more than what is still due (change is given back in cash, not recorded), and not on a ticket left
 * for an invoice: the invoice takes it from there.
 */
export function checkPayment(
  ticket: PayableTicket,
  alreadyPaidCents: number,
  payment: { method: ManualPaymentMethod; amountCents: number; reference: string },
): Settlement {
  if (ticket.status === 'open') {
    throw new DomainError('conflict', 'Finish the ticket first: payment is taken once every pair is done.');
  }
  if (ticket.settlement === 'to-invoice') {
    throw new DomainError('conflict', 'This ticket is left for an invoice; the invoice takes the payment.');
  }
  const balance = ticket.totalCents - alreadyPaidCents;
  if (balance <= 0) throw new DomainError('conflict', 'This ticket is already paid in full.');
  if (payment.amountCents > balance) {
    const message = `That is more than the ${formatMoney(balance, ticket.currency)} still due; record what was kept.`;
    throw new DomainError('invalid_input', message, { amountCents: [message] });
  }
  if (payment.method !== 'cash' && payment.reference.length === 0) {
    const message =
      payment.method === 'cheque' ? 'Enter the cheque number.' : "Enter the terminal's reference for the card payment.";
    throw new DomainError('invalid_input', message, { reference: [message] });
  }
  return alreadyPaidCents + payment.amountCents >= ticket.totalCents ? 'paid-on-site' : 'unpaid';
}

/** "Leave for an invoice": what is still due goes on an invoice; a ticket paid in full has nothing to invoice. */
export function checkToInvoice(ticket: PayableTicket): void {
  if (ticket.status === 'open') {
    throw new DomainError('conflict', 'Finish the ticket first: it is left for an invoice once every pair is done.');
  }
  if (ticket.settlement === 'paid-on-site') {
    throw new DomainError('conflict', 'This ticket is already paid on site; there is nothing to invoice.');
  }
}

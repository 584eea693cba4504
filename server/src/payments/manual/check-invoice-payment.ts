import { formatMoney } from '@keenroute/shared';
import { DomainError } from '../../common/errors/domain-error';
import type { Invoice } from '../../invoices/entities/invoice.entity';
import { balanceCents } from '../../invoices/invoice-balance';
import type { ManualPaymentMethod } from '../entities/payment.entity';

export interface ManualPayment {
  method: ManualPaymentMethod;
  amountCents: number;
  reference: string;
}

type PayableInvoice = Pick<Invoice, 'status' | 'number' | 'currency' | 'totalCents' | 'paidCents' | 'creditedCents'>;

/**
 * Whether a payment taken by hand may be recorded on the invoice as it stands (read under its lock): issued, not void,
 * something owed, no more than that, and a reference for a cheque or a terminal payment so it can be traced.
 */
export function checkInvoicePayment(invoice: PayableInvoice, payment: ManualPayment): void {
  if (invoice.status === 'draft') {
    throw new DomainError('conflict', 'Issue the invoice first; a draft takes no payments.');
  }
  if (invoice.status === 'void') {
    throw new DomainError('conflict', `Invoice ${invoice.number} is void; it takes no payments.`);
  }
  const owed = balanceCents(invoice);
  if (owed === 0) throw new DomainError('conflict', `Invoice ${invoice.number} is paid in full; nothing is owed.`);
  if (payment.amountCents > owed) {
    const message = `That is more than the ${formatMoney(owed, invoice.currency)} still owed on invoice ${invoice.number}.`;
    throw new DomainError('invalid_input', message, { amountCents: [message] });
  }
  if (payment.method !== 'cash' && payment.reference.length === 0) {
    const message =
      payment.method === 'cheque' ? 'Enter the cheque number.' : "Enter the terminal's reference for the card payment.";
    throw new DomainError('invalid_input', message, { reference: [message] });
  }
}

import type { EntityManager } from 'typeorm';
import { notFound } from '../common/errors/domain-error';
import { Invoice } from './entities/invoice.entity';
import { statusFromMoney } from './invoice-balance';

/** Locks the invoice row for the rest of the caller's transaction: payments, credits, voids and sends queue on it. */
export async function lockInvoice(manager: EntityManager, invoiceId: string): Promise<Invoice> {
  const invoice = await manager
    .getRepository(Invoice)
    .createQueryBuilder('invoice')
    .setLock('pessimistic_write')
    .where('invoice.id = :invoiceId', { invoiceId })
    .getOne();
  if (!invoice) throw notFound('The invoice');
  return invoice;
}

/**
 * Re-adds the invoice's payments and credit notes from their rows and sets the status that follows, in the caller's
 * transaction (which must hold the lock from lockInvoice). Every money change on an invoice ends with this call, so
 * paid_cents, credited_cents and status never disagree with the rows.
 */
export async function settleInvoice(manager: EntityManager, invoice: Invoice): Promise<Invoice> {
  const [money] = await manager.query<{ paid: string; credited: string }[]>(
    `SELECT
       (SELECT coalesce(sum(amount_cents), 0) FROM payments WHERE invoice_id = $1) AS paid,
       (SELECT coalesce(sum(amount_cents), 0) FROM credit_notes WHERE invoice_id = $1) AS credited`,
    [invoice.id],
  );
  const paidCents = Number(money?.paid ?? 0);
  const creditedCents = Number(money?.credited ?? 0);
  const status = statusFromMoney({ ...invoice, paidCents, creditedCents });
  if (status !== invoice.status || paidCents !== invoice.paidCents || creditedCents !== invoice.creditedCents) {
    await manager.getRepository(Invoice).update(invoice.id, { paidCents, creditedCents, status });
  }
  return Object.assign(invoice, { paidCents, creditedCents, status });
}

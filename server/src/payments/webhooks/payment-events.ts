import { Injectable, Logger } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource, EntityManager } from 'typeorm';
import type Stripe from 'stripe';
import { AuditService } from '../../audit/audit.service';
import { lockInvoice, settleInvoice } from '../../invoices/invoice-ledger';
import { Payment } from '../entities/payment.entity';

/** What one webhook event did: a repeat changes nothing; an online payment names the row it wrote. */
export type EventOutcome =
  { duplicate: true } | { duplicate: false; invoiceId: string | null; paymentId: string | null };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;
// The payments.reference column's width; the service's payment ids are far shorter.
const REFERENCE_LENGTH = 60;

/**
 * Turns verified payment-service events into payments, exactly once. Each event runs in one transaction: its id is
 * written first (a repeat finds it and stops), then the invoice is locked, the payment inserted under its unique
 * external id (a second event about the same payment adds nothing) and the invoice settled. A failure rolls all of it
 * back, the endpoint answers 500 and the service sends the event again.
 */
@Injectable()
export class PaymentEvents {
  private readonly logger = new Logger(PaymentEvents.name);

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly audit: AuditService,
  ) {}

  handle(event: Stripe.Event): Promise<EventOutcome> {
    return this.dataSource.transaction(async (manager) => {
      const session = event.type.startsWith('checkout.session.')
        ? (event.data.object as Stripe.Checkout.Session)
        : null;
      const invoiceId = session ? await this.invoiceIdFor(manager, session) : null;
      const seen = await manager.query<{ id: string }[]>(
        `INSERT INTO payment_events (id, type, created, invoice_id) VALUES ($1, $2, to_timestamp($3), $4)
         ON CONFLICT (id) DO NOTHING RETURNING id`,
        [event.id, event.type.slice(0, 80), event.created, invoiceId],
      );
      if (seen.length === 0) return { duplicate: true };
      if (!session) return { duplicate: false, invoiceId: null, paymentId: null };

      const paidNow =
        event.type === 'checkout.session.async_payment_succeeded' ||
        // A delayed method (a bank debit) completes unpaid; its money arrives later as async_payment_succeeded.
        (event.type === 'checkout.session.completed' && session.payment_status === 'paid');
      if (paidNow) return { duplicate: false, invoiceId, paymentId: await this.paid(manager, session, invoiceId) };
      if (event.type === 'checkout.session.expired') {
        // Events can arrive out of order: an expiry never undoes a checkout that completed.
        await manager.query(`UPDATE invoice_checkouts SET status = 'expired' WHERE id = $1 AND status = 'open'`, [
          session.id,
        ]);
      }
      return { duplicate: false, invoiceId, paymentId: null };
    });
  }

  /** Records the session's money on its invoice; null when nothing new was recorded. */
  private async paid(
    manager: EntityManager,
    session: Stripe.Checkout.Session,
    invoiceId: string | null,
  ): Promise<string | null> {
    await manager.query(
      `UPDATE invoice_checkouts SET status = 'complete', completed_at = coalesce(completed_at, now()) WHERE id = $1`,
      [session.id],
    );
    if (!invoiceId) {
      this.logger.warn({ session: session.id }, 'a paid checkout names no invoice of ours; nothing recorded');
      return null;
    }
    const amountCents = session.amount_total ?? 0;
    if (!Number.isInteger(amountCents) || amountCents <= 0) {
      this.logger.warn({ session: session.id, amountCents }, 'a paid checkout without an amount; nothing recorded');
      return null;
    }
    // The payment intent identifies the money itself, whichever event (or session) reports it.
    const externalId = paymentIntentId(session) ?? session.id;
    const invoice = await lockInvoice(manager, invoiceId);
    if (invoice.status === 'void' || invoice.status === 'draft') {
      // The money came in all the same; it is recorded so the books show it, and the office refunds it.
      this.logger.warn({ invoiceId, status: invoice.status }, 'online payment on an invoice that is not open');
    }
    const inserted = await manager
      .createQueryBuilder()
      .insert()
      .into(Payment)
      .values({
        invoiceId,
        ticketId: null,
        method: 'online',
        amountCents,
        reference: externalId.slice(0, REFERENCE_LENGTH),
        externalId,
        recordedBy: null,
      })
      .orIgnore()
      .returning(['id'])
      .execute();
    const paymentId = (inserted.raw as { id: string }[])[0]?.id ?? null;
    if (!paymentId) return null;
    // No actor: the payment service reported it, through a signed event.
    await this.audit.record(
      {
        action: 'payment-recorded',
        actor: null,
        subject: { type: 'invoice', id: invoiceId },
        detail: { paymentId, invoiceNumber: invoice.number, method: 'online', amountCents, reference: externalId },
      },
      manager,
    );
    await settleInvoice(manager, invoice);
    return paymentId;
  }

  /** Our checkout row knows the invoice; failing that (a session we never stored), the metadata we put on it does. */
  private async invoiceIdFor(manager: EntityManager, session: Stripe.Checkout.Session): Promise<string | null> {
    const [stored] = await manager.query<{ invoice_id: string }[]>(
      `SELECT invoice_id FROM invoice_checkouts WHERE id = $1`,
      [session.id],
    );
    if (stored) return stored.invoice_id;
    const named = session.metadata?.invoiceId ?? session.client_reference_id ?? null;
    if (!named || !UUID.test(named)) return null;
    const [invoice] = await manager.query<{ id: string }[]>(`SELECT id FROM invoices WHERE id = $1`, [named]);
    return invoice?.id ?? null;
  }
}

function paymentIntentId(session: Stripe.Checkout.Session): string | null {
  const intent = session.payment_intent;
  if (!intent) return null;
  return typeof intent === 'string' ? intent : intent.id;
}

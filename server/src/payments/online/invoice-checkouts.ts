import { formatMoney } from '@keenroute/shared';
import { Inject, Injectable, Logger, ServiceUnavailableException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import { MoreThan, type DataSource } from 'typeorm';
import type Stripe from 'stripe';
import { DomainError } from '../../common/errors/domain-error';
import type { AppConfig } from '../../config/environment';
import { InvoiceCheckout } from '../entities/invoice-checkout.entity';
import { STRIPE_CLIENT } from '../stripe-client';
import { onlineMinimumCents, owedCents, PublicInvoicesService } from './public-invoices.service';

/**
 * A checkout opened for the same amount this recently is handed out again, so a double click or a reload does not
 * leave two payable sessions for one balance (the service keeps a session open for 24 hours; Keenroute's own choice).
 */
const REUSE_OPEN_CHECKOUT_MS = 30 * 60_000;

/**
 * Opens the payment service's hosted checkout for what an invoice still owes. Nothing here marks anything paid: only
 * the signed webhook does, so a customer returning to the success page proves nothing by itself.
 */
@Injectable()
export class InvoiceCheckouts {
  private readonly logger = new Logger(InvoiceCheckouts.name);
  private readonly appUrl: string;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    @Inject(STRIPE_CLIENT) private readonly stripe: Stripe,
    private readonly invoices: PublicInvoicesService,
    config: ConfigService<AppConfig, true>,
  ) {
    this.appUrl = config.get('APP_URL', { infer: true }).replace(/\/+$/, '');
  }

  async start(token: string): Promise<{ url: string }> {
    const invoice = await this.invoices.byToken(token);
    if (invoice.status === 'void') {
      throw new DomainError('conflict', `Invoice ${invoice.number} is void; nothing is owed on it.`);
    }
    const amountCents = owedCents(invoice);
    if (amountCents === 0) throw new DomainError('conflict', `Invoice ${invoice.number} is paid; nothing is owed.`);
    const minimum = onlineMinimumCents(invoice.currency);
    if (amountCents < minimum) {
      throw new DomainError(
        'conflict',
        `The ${formatMoney(amountCents, invoice.currency)} still owed is below the smallest online payment ` +
          `(${formatMoney(minimum, invoice.currency)}); pay it by cash or cheque.`,
      );
    }

    const checkouts = this.dataSource.getRepository(InvoiceCheckout);
    const recent = await checkouts.findOne({
      where: {
        invoiceId: invoice.id,
        status: 'open',
        amountCents,
        createdAt: MoreThan(new Date(Date.now() - REUSE_OPEN_CHECKOUT_MS)),
      },
      order: { createdAt: 'DESC' },
    });
    if (recent) return { url: recent.url };

    const metadata = { invoiceId: invoice.id, invoiceNumber: invoice.number };
    const payPage = `${this.appUrl}/pay/${token}`;
    let session: Stripe.Checkout.Session;
    try {
      session = await this.stripe.checkout.sessions.create({
        mode: 'payment',
        line_items: [
          {
            quantity: 1,
            price_data: {
              currency: invoice.currency.toLowerCase(),
              unit_amount: amountCents,
              product_data: { name: `Invoice ${invoice.number}` },
            },
          },
        ],
        customer_email: invoice.billToEmail ?? undefined,
        client_reference_id: invoice.id,
        metadata,
        payment_intent_data: { metadata },
        // The literal {CHECKOUT_SESSION_ID} is filled in by the service on its redirect.
        success_url: `${payPage}/done?session_id={CHECKOUT_SESSION_ID}`,
        cancel_url: payPage,
      });
    } catch (error) {
      this.logger.error({ err: error, invoiceId: invoice.id }, 'the payment service refused or did not answer');
      throw new ServiceUnavailableException('Online payment is not available right now. Try again in a few minutes.');
    }
    if (!session.url) {
      throw new ServiceUnavailableException('The payment service opened no checkout page. Try again in a few minutes.');
    }
    await checkouts.insert({
      id: session.id,
      invoiceId: invoice.id,
      amountCents,
      currency: invoice.currency,
      url: session.url,
      status: 'open',
    });
    return { url: session.url };
  }
}

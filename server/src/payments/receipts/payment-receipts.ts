import { Injectable, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import type { AppConfig } from '../../config/environment';
import { InvoiceMailer } from '../../invoices/documents/invoice-mailer';
import { BusinessProfile } from '../../invoices/entities/business-profile.entity';
import { Invoice } from '../../invoices/entities/invoice.entity';
import { InvoicePayLink } from '../../invoices/invoice-pay-link';
import { Payment } from '../entities/payment.entity';
import { owedCents } from '../online/public-invoices.service';
import { receiptMail } from './receipt-mail';

/**
 * Queues the receipt for one invoice payment to the invoice's bill-to address, through the send log. Called only after
 * the payment's transaction has committed; receipt_sent_at is set when the relay takes the message (InvoiceMailer).
 */
@Injectable()
export class PaymentReceipts {
  private readonly logger = new Logger(PaymentReceipts.name);
  private readonly timeZone: string;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly mailer: InvoiceMailer,
    private readonly payLink: InvoicePayLink,
    config: ConfigService<AppConfig, true>,
  ) {
    this.timeZone = config.get('BUSINESS_TIME_ZONE', { infer: true });
  }

  /** True when the receipt is queued; false when there is nowhere to send it. */
  async send(paymentId: string, sentBy: string | null = null): Promise<boolean> {
    const payment = await this.dataSource.getRepository(Payment).findOneBy({ id: paymentId });
    if (!payment?.invoiceId) return false;
    const [invoice, profile] = await Promise.all([
      this.dataSource.getRepository(Invoice).findOneBy({ id: payment.invoiceId }),
      this.dataSource.getRepository(BusinessProfile).findOneBy({ id: 1 }),
    ]);
    if (!invoice?.number || !invoice.billToEmail) return false;
    const balance = owedCents(invoice);
    const mail = receiptMail({
      businessName: profile?.name ?? '',
      billToName: invoice.billToName,
      invoiceNumber: invoice.number,
      currency: invoice.currency,
      amountCents: payment.amountCents,
      method: payment.method,
      reference: payment.reference,
      receivedAt: payment.recordedAt,
      timeZone: this.timeZone,
      totalCents: invoice.totalCents,
      paidCents: invoice.paidCents,
      balanceCents: balance,
      payUrl: balance > 0 && invoice.status !== 'void' ? this.payLink.url(invoice.id) : null,
    });
    await this.mailer.queueLogged({
      invoiceId: invoice.id,
      paymentId,
      kind: 'receipt',
      to: invoice.billToEmail,
      ...mail,
      sentBy,
    });
    return true;
  }

  /** send, with any failure logged instead of thrown: the payment it is for has already been recorded. */
  async sendQuietly(paymentId: string, sentBy: string | null = null): Promise<boolean> {
    try {
      return await this.send(paymentId, sentBy);
    } catch (error) {
      this.logger.error({ err: error, paymentId }, 'the receipt could not be sent');
      return false;
    }
  }
}

import { Injectable, type OnModuleInit } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { IsNull, type EntityManager, type Repository } from 'typeorm';
import type { OutboxMail } from '../../mail/entities/outbox-mail.entity';
import { MailOutbox } from '../../mail/mail-outbox';
import { MailService, type MailAttachment } from '../../mail/mail.service';
import { Payment } from '../../payments/entities/payment.entity';
import { InvoiceMail, type InvoiceMailKind } from '../entities/invoice-mail.entity';
import { Invoice } from '../entities/invoice.entity';
import { InvoicePdfService } from './invoice-pdf.service';

export interface LoggedMail {
  invoiceId: string | null;
  paymentId?: string | null;
  kind: InvoiceMailKind;
  to: string;
  subject: string;
  text: string;
  html?: string;
  attachments?: MailAttachment[];
  sentBy?: string | null;
}

/** A send-log mail for the queue: the invoice's PDF is named by `attachInvoicePdf`, rendered when it goes out. */
export type QueuedLoggedMail = Omit<LoggedMail, 'attachments'> & { attachInvoicePdf?: boolean };

// The column widths of invoice_mails.
const SUBJECT_MAX = 300;
const ERROR_MAX = 500;
const OUTBOX_TOPIC = 'invoice-mail';
const INVOICE_PDF = 'invoice-pdf';

/**
 * Every invoice-related e-mail (invoices, reminders, receipts, statements) and its send log. Reminders already run in
 * a job of their own and send at once (sendLogged); the rest are queued (queueLogged): the log row says 'queued' and
 * the mail queue's outcome turns it into 'sent' or 'failed' with the relay's reason. Neither throws for a refusal.
 */
@Injectable()
export class InvoiceMailer implements OnModuleInit {
  constructor(
    private readonly mail: MailService,
    private readonly outbox: MailOutbox,
    private readonly pdfs: InvoicePdfService,
    @InjectRepository(InvoiceMail) private readonly log: Repository<InvoiceMail>,
  ) {}

  onModuleInit(): void {
    // Rendered again at send time rather than stored: an issued invoice's PDF is drawn from rows that no longer change,
    // and a PDF of a few hundred kilobytes per message would otherwise sit in the outbox table until it is cleaned.
    this.outbox.renderAttachments(INVOICE_PDF, async (invoiceId, manager) => {
      const { pdf, fileName } = await this.pdfs.renderWithDocument(invoiceId, manager);
      return { filename: fileName, content: pdf, contentType: 'application/pdf' };
    });
    this.outbox.onOutcome(OUTBOX_TOPIC, (sent, manager) => this.recordOutcome(sent, manager));
  }

  async sendLogged(mail: LoggedMail): Promise<InvoiceMail> {
    const result = await this.mail.deliver({
      to: mail.to,
      subject: mail.subject,
      text: mail.text,
      html: mail.html,
      attachments: mail.attachments,
    });
    return this.log.save(
      this.log.create({
        ...this.logRow(mail),
        status: result.ok ? 'sent' : 'failed',
        error: result.ok ? null : result.error.slice(0, ERROR_MAX) || 'The mail relay gave no reason.',
      }),
    );
  }

  /** The send-log row ('queued') and the outbox message, written together. */
  queueLogged(mail: QueuedLoggedMail): Promise<InvoiceMail> {
    return this.log.manager.transaction(async (manager) => {
      const row = await manager.save(manager.create(InvoiceMail, { ...this.logRow(mail), status: 'queued' }));
      await this.outbox.queue(
        {
          key: `${OUTBOX_TOPIC}:${row.id}`,
          topic: OUTBOX_TOPIC,
          refId: row.id,
          to: mail.to,
          subject: mail.subject,
          text: mail.text,
          html: mail.html,
          attachment: mail.attachInvoicePdf && mail.invoiceId ? { kind: INVOICE_PDF, id: mail.invoiceId } : undefined,
        },
        manager,
      );
      return row;
    });
  }

  private logRow(mail: QueuedLoggedMail): Partial<InvoiceMail> {
    return {
      invoiceId: mail.invoiceId,
      paymentId: mail.paymentId ?? null,
      kind: mail.kind,
      toEmail: mail.to,
      subject: mail.subject.slice(0, SUBJECT_MAX),
      sentBy: mail.sentBy ?? null,
    };
  }

  /** The queue's word on one logged mail; an invoice counts as "sent on" and a receipt as sent only once delivered. */
  private async recordOutcome(sent: OutboxMail, manager: EntityManager): Promise<void> {
    if (!sent.refId) return;
    await manager.update(InvoiceMail, sent.refId, { status: sent.status, error: sent.lastError });
    if (sent.status !== 'sent') return;
    const row = await manager.findOneBy(InvoiceMail, { id: sent.refId });
    if (row?.kind === 'invoice' && row.invoiceId) {
      // Only the first delivered send counts as "sent on"; a resend leaves the date alone.
      await manager.update(Invoice, { id: row.invoiceId, sentAt: IsNull() }, { sentAt: sent.sentAt });
    }
    if (row?.kind === 'receipt' && row.paymentId) {
      await manager.update(Payment, { id: row.paymentId }, { receiptSentAt: sent.sentAt });
    }
  }
}

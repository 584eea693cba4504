import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
import { MailService, type MailAttachment } from '../../mail/mail.service';
import { InvoiceMail, type InvoiceMailKind } from '../entities/invoice-mail.entity';

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

// The column widths of invoice_mails.
const SUBJECT_MAX = 300;
const ERROR_MAX = 500;

/**
 * Sends every invoice-related e-mail (invoices, reminders, receipts, statements) and writes it to the send log, sent
 * or failed with the relay's reason. It never throws for a failed delivery: callers read the row's status.
 */
@Injectable()
export class InvoiceMailer {
  constructor(
    private readonly mail: MailService,
    @InjectRepository(InvoiceMail) private readonly log: Repository<InvoiceMail>,
  ) {}

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
        invoiceId: mail.invoiceId,
        paymentId: mail.paymentId ?? null,
        kind: mail.kind,
        toEmail: mail.to,
        subject: mail.subject.slice(0, SUBJECT_MAX),
        status: result.ok ? 'sent' : 'failed',
        error: result.ok ? null : result.error.slice(0, ERROR_MAX) || 'The mail relay gave no reason.',
        sentBy: mail.sentBy ?? null,
      }),
    );
  }
}

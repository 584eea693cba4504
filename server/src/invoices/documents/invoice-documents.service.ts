import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import { InvoiceAccess } from '../../access/invoice-access';
import type { Actor } from '../../auth/actor';
import { DomainError, notFound } from '../../common/errors/domain-error';
import type { InvoiceDto } from '../dto/invoice-response.dto';
import { InvoiceMail } from '../entities/invoice-mail.entity';
import { Invoice } from '../entities/invoice.entity';
import { InvoicePayLink } from '../invoice-pay-link';
import { InvoiceReader } from '../invoice-reader';
import { InvoicesService } from '../invoices.service';
import type { InvoiceMailDto, SendInvoiceDto } from './dto/invoice-documents.dto';
import { InvoiceDocumentLoader } from './invoice-document';
import { invoiceMail } from './invoice-mail';
import { InvoiceMailer } from './invoice-mailer';
import { invoicePdfFileName, InvoicePdfService } from './invoice-pdf.service';

export interface InvoicePdfFile {
  pdf: Buffer;
  fileName: string;
}

const noAddress = (issued: boolean) => {
  const message =
    'There is no e-mail address to send this invoice to: enter one, or add it to the customer or stop' +
    (issued ? ' (the invoice is issued; send it again once there is an address).' : '.');
  return new DomainError('invalid_input', message, { to: [message] });
};

/** The invoice as a document: its PDF (signed in, or by pay link), e-mailing it, and its send log. */
@Injectable()
export class InvoiceDocumentsService {
  constructor(
    @InjectRepository(Invoice) private readonly invoices: Repository<Invoice>,
    @InjectRepository(InvoiceMail) private readonly mails: Repository<InvoiceMail>,
    private readonly access: InvoiceAccess,
    private readonly issuer: InvoicesService,
    private readonly reader: InvoiceReader,
    private readonly payLink: InvoicePayLink,
    private readonly pdfs: InvoicePdfService,
    private readonly loader: InvoiceDocumentLoader,
    private readonly mailer: InvoiceMailer,
  ) {}

  async pdf(actor: Actor, invoiceId: string): Promise<InvoicePdfFile> {
    const invoice = await this.access.requireInvoice(actor, invoiceId, 'read');
    return { pdf: await this.pdfs.render(invoice.id), fileName: invoicePdfFileName(invoice) };
  }

  /** By the pay link alone: the same answer for a forged token and for a draft, so neither can be probed. */
  async publicPdf(token: string): Promise<InvoicePdfFile> {
    const invoiceId = this.payLink.invoiceIdFor(token);
    const invoice = invoiceId ? await this.invoices.findOneBy({ id: invoiceId }) : null;
    if (!invoice || invoice.status === 'draft') throw notFound('The invoice');
    return { pdf: await this.pdfs.render(invoice.id), fileName: invoicePdfFileName(invoice) };
  }

  /**
   * Queues the invoice e-mail with its PDF (a draft is issued first, and stays issued whatever the mail relay says).
   * The send log says 'queued' at once, then 'sent' or 'failed'; the invoice counts as sent on once it was delivered.
   */
  async send(actor: Actor, invoiceId: string, dto: SendInvoiceDto): Promise<InvoiceDto> {
    let invoice = await this.access.requireInvoice(actor, invoiceId, 'manage');
    if (invoice.status === 'void') {
      throw new DomainError('conflict', `Invoice ${invoice.number} is void; there is nothing to send.`);
    }
    if (!(dto.to ?? invoice.billToEmail)) throw noAddress(false);
    if (invoice.status === 'draft') {
      await this.issuer.issue(actor, invoiceId);
      invoice = await this.invoices.findOneByOrFail({ id: invoiceId });
    }
    // Issuing takes the bill-to afresh, so the address is read again after it.
    const to = dto.to ?? invoice.billToEmail;
    if (!to) throw noAddress(true);

    // The text is written now, from the issued invoice; the PDF is drawn from the same rows when the mail goes out.
    const document = await this.loader.load(invoiceId);
    await this.mailer.queueLogged({
      invoiceId,
      kind: 'invoice',
      to,
      ...invoiceMail(document),
      attachInvoicePdf: true,
      sentBy: actor.id,
    });
    return this.reader.detail(invoiceId);
  }

  async mailLog(actor: Actor, invoiceId: string): Promise<InvoiceMailDto[]> {
    await this.access.requireInvoice(actor, invoiceId, 'manage');
    const rows = await this.mails.find({ where: { invoiceId }, order: { createdAt: 'DESC', id: 'DESC' } });
    return rows.map((row) => ({
      id: row.id,
      kind: row.kind,
      toEmail: row.toEmail,
      subject: row.subject,
      status: row.status,
      error: row.error,
      createdAt: row.createdAt.toISOString(),
    }));
  }
}

import { Injectable } from '@nestjs/common';
import { toBuffer as qrPng } from 'qrcode';
import type { EntityManager } from 'typeorm';
import type { Invoice } from '../entities/invoice.entity';
import { InvoiceDocumentLoader, type InvoiceDocument } from './invoice-document';
import { renderInvoicePdf } from './invoice-pdf';

/** KR-2026-0001.pdf; a draft has no number yet, so its file is named after the invoice id. */
export function invoicePdfFileName(invoice: Pick<Invoice, 'id' | 'number'>): string {
  return invoice.number ? `${invoice.number}.pdf` : `draft-invoice-${invoice.id.slice(0, 8)}.pdf`;
}

export interface RenderedInvoice {
  document: InvoiceDocument;
  pdf: Buffer;
  fileName: string;
}

/** Renders an invoice's PDF (other modules attach it to reminders and statements); access is the caller's to check. */
@Injectable()
export class InvoicePdfService {
  constructor(private readonly loader: InvoiceDocumentLoader) {}

  async render(invoiceId: string, manager?: EntityManager): Promise<Buffer> {
    return (await this.renderWithDocument(invoiceId, manager)).pdf;
  }

  /** The PDF with what it was drawn from, for callers that also write the e-mail around it. */
  async renderWithDocument(invoiceId: string, manager?: EntityManager): Promise<RenderedInvoice> {
    const document = await this.loader.load(invoiceId, manager);
    // Error correction M and a small quiet zone: reads well from paper and screens at the printed size.
    const qr = document.payUrl
      ? await qrPng(document.payUrl, { type: 'png', errorCorrectionLevel: 'M', margin: 1, width: 288 })
      : null;
    return { document, pdf: await renderInvoicePdf(document, qr), fileName: invoicePdfFileName(document.invoice) };
  }
}

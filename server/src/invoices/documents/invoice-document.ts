import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { In, type DataSource, type EntityManager } from 'typeorm';
import { notFound } from '../../common/errors/domain-error';
import { Payment } from '../../payments/entities/payment.entity';
import type { BusinessProfile } from '../entities/business-profile.entity';
import { CreditNote } from '../entities/credit-note.entity';
import { InvoiceLine } from '../entities/invoice-line.entity';
import { Invoice } from '../entities/invoice.entity';
import { balanceCents } from '../invoice-balance';
import { InvoicePayLink } from '../invoice-pay-link';
import { BusinessProfileService } from './business-profile.service';

/** Everything an invoice's PDF prints, read in one go. */
export interface InvoiceDocument {
  invoice: Invoice;
  lines: InvoiceLine[];
  payments: Payment[];
  creditNotes: CreditNote[];
  profile: BusinessProfile;
  /** The business logo as PNG, or null. */
  logo: Buffer | null;
  /** What is still owed (0 on a void invoice, which asks for nothing). */
  balanceCents: number;
  /** The private pay link, when the invoice is issued, not void and something is owed. */
  payUrl: string | null;
}

/** Loads an invoice for printing and mailing; callers have already checked who may see it. */
@Injectable()
export class InvoiceDocumentLoader {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly profiles: BusinessProfileService,
    private readonly payLink: InvoicePayLink,
  ) {}

  async load(invoiceId: string, manager: EntityManager = this.dataSource.manager): Promise<InvoiceDocument> {
    const invoice = await manager.getRepository(Invoice).findOneBy({ id: invoiceId });
    if (!invoice) throw notFound('The invoice');
    const [lines, creditNotes, profile] = await Promise.all([
      manager.getRepository(InvoiceLine).find({ where: { invoiceId }, order: { position: 'ASC' } }),
      manager.getRepository(CreditNote).find({ where: { invoiceId }, order: { createdAt: 'ASC', id: 'ASC' } }),
      this.profiles.profile(),
    ]);
    const ticketIds = [...new Set(lines.map((line) => line.ticketId).filter((id): id is string => id !== null))];
    const payments = await manager.getRepository(Payment).find({
      // A draft counts the on-site payments of its tickets already; issuing attaches them to the invoice.
      where:
        invoice.status === 'draft' && ticketIds.length > 0
          ? [{ invoiceId }, { ticketId: In(ticketIds) }]
          : { invoiceId },
      order: { recordedAt: 'ASC', id: 'ASC' },
    });
    const balance = invoice.status === 'void' ? 0 : balanceCents(invoice);
    const payable = (invoice.status === 'sent' || invoice.status === 'part-paid') && balance > 0;
    return {
      invoice,
      lines,
      payments,
      creditNotes,
      profile,
      logo: await this.profiles.logo(profile),
      balanceCents: balance,
      payUrl: payable ? this.payLink.url(invoice.id) : null,
    };
  }
}

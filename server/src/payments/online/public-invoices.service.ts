import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import { DomainError } from '../../common/errors/domain-error';
import type { AppConfig } from '../../config/environment';
import { BusinessProfile } from '../../invoices/entities/business-profile.entity';
import { InvoiceLine } from '../../invoices/entities/invoice-line.entity';
import { Invoice } from '../../invoices/entities/invoice.entity';
import { balanceCents, isOverdue } from '../../invoices/invoice-balance';
import { InvoicePayLink } from '../../invoices/invoice-pay-link';
import { todayIn } from '../../stops/business-today';
import type { PublicInvoiceDto, PublicInvoiceStatusDto } from './dto/public-invoice.dto';

/** An issued invoice as its pay link shows it. */
export type IssuedInvoice = Invoice & { number: string; issueDate: string; dueDate: string };

/** Owed now: nothing on a void invoice, whatever its total was. */
export const owedCents = (invoice: Invoice) => (invoice.status === 'void' ? 0 : balanceCents(invoice));

/**
 * The smallest charge the payment service takes: 50 cents for USD in its published "minimum and maximum charge
 * amounts" table; other currencies have their own minimum there, and 50 minor units is taken for them until listed.
 */
const ONLINE_MINIMUM_CENTS: Readonly<Record<string, number>> = { USD: 50 };
export const onlineMinimumCents = (currency: string) => ONLINE_MINIMUM_CENTS[currency] ?? 50;

export const canPayOnline = (invoice: Invoice) =>
  (invoice.status === 'sent' || invoice.status === 'part-paid') &&
  owedCents(invoice) >= onlineMinimumCents(invoice.currency);

/**
 * The public side of an invoice, reached only through its signed pay link. A link that does not verify, or names a
 * draft (not yet sent to anyone), answers the same 404, so a link cannot be used to probe which invoices exist.
 */
@Injectable()
export class PublicInvoicesService {
  private readonly timeZone: string;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly payLink: InvoicePayLink,
    config: ConfigService<AppConfig, true>,
  ) {
    this.timeZone = config.get('BUSINESS_TIME_ZONE', { infer: true });
  }

  async byToken(token: string): Promise<IssuedInvoice> {
    const invoiceId = this.payLink.invoiceIdFor(token);
    const invoice = invoiceId ? await this.dataSource.getRepository(Invoice).findOneBy({ id: invoiceId }) : null;
    if (!invoice || invoice.status === 'draft' || !invoice.number || !invoice.issueDate || !invoice.dueDate) {
      throw new DomainError('not_found', 'This pay link is not valid. Ask the sender for a new one.');
    }
    return invoice as IssuedInvoice;
  }

  async read(token: string): Promise<PublicInvoiceDto> {
    const invoice = await this.byToken(token);
    const [lines, profile] = await Promise.all([
      this.dataSource.getRepository(InvoiceLine).find({ where: { invoiceId: invoice.id }, order: { position: 'ASC' } }),
      this.dataSource.getRepository(BusinessProfile).findOneBy({ id: 1 }),
    ]);
    const shown = lines.map((line) => ({ description: line.description, amountCents: line.amountCents }));
    // The invoice discount is taken before tax; shown as its own line so lines + tax add up to the total.
    if (invoice.discountTotalCents > 0)
      shown.push({ description: 'Discount', amountCents: -invoice.discountTotalCents });
    return {
      number: invoice.number,
      status: invoice.status,
      overdue: isOverdue(invoice, todayIn(this.timeZone)),
      billToName: invoice.billToName,
      issueDate: invoice.issueDate,
      dueDate: invoice.dueDate,
      currency: invoice.currency,
      totalCents: invoice.totalCents,
      paidCents: invoice.paidCents,
      creditedCents: invoice.creditedCents,
      balanceCents: owedCents(invoice),
      lines: shown,
      taxCents: invoice.taxCents,
      business: { name: profile?.name ?? '', email: profile?.email ?? '', phone: profile?.phone ?? '' },
      pdfUrl: `/api/public/invoices/${encodeURIComponent(token)}/pdf`,
      canPayOnline: canPayOnline(invoice),
    };
  }

  async status(token: string): Promise<PublicInvoiceStatusDto> {
    const invoice = await this.byToken(token);
    return { status: invoice.status, balanceCents: owedCents(invoice), paidCents: invoice.paidCents };
  }
}

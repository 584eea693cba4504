import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import { In, type DataSource, type EntityManager } from 'typeorm';
import { InvoiceAccess } from '../access/invoice-access';
import type { Actor } from '../auth/actor';
import { notFound } from '../common/errors/domain-error';
import type { AppConfig } from '../config/environment';
import { Customer } from '../customers/entities/customer.entity';
import { Payment } from '../payments/entities/payment.entity';
import { todayIn } from '../stops/business-today';
import { Stop } from '../stops/entities/stop.entity';
import type { InvoiceDto, InvoiceSummaryDto, InvoiceTicketDto } from './dto/invoice-response.dto';
import { CreditNote } from './entities/credit-note.entity';
import { InvoiceLine } from './entities/invoice-line.entity';
import { Invoice } from './entities/invoice.entity';
import { balanceCents, daysOverdue, isOverdue } from './invoice-balance';
import { InvoicePayLink } from './invoice-pay-link';

/** Reads invoices as the API shows them; callers have already checked the actor may read the invoice. */
@Injectable()
export class InvoiceReader {
  private readonly timeZone: string;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly access: InvoiceAccess,
    private readonly payLink: InvoicePayLink,
    config: ConfigService<AppConfig, true>,
  ) {
    this.timeZone = config.get('BUSINESS_TIME_ZONE', { infer: true });
  }

  /** Today in the business time zone: what due dates and overdue days count from. */
  today(): string {
    return todayIn(this.timeZone);
  }

  async get(actor: Actor, id: string): Promise<InvoiceDto> {
    await this.access.requireInvoice(actor, id, 'read');
    return this.detail(id);
  }

  summary(invoice: Invoice, today = this.today()): InvoiceSummaryDto {
    const overdue = isOverdue(invoice, today);
    return {
      id: invoice.id,
      number: invoice.number,
      status: invoice.status,
      overdue,
      daysOverdue: overdue && invoice.dueDate ? daysOverdue(invoice.dueDate, today) : 0,
      billTo: invoice.billTo,
      billToName: invoice.billToName,
      issueDate: invoice.issueDate,
      dueDate: invoice.dueDate,
      currency: invoice.currency,
      totalCents: invoice.totalCents,
      // A void invoice asks for nothing, whatever its total was.
      balanceCents: invoice.status === 'void' ? 0 : balanceCents(invoice),
      createdAt: invoice.createdAt.toISOString(),
    };
  }

  /** The whole invoice; pass the transaction's manager to read what it has written before it commits. */
  async detail(invoiceId: string, manager: EntityManager = this.dataSource.manager): Promise<InvoiceDto> {
    const invoice = await manager.getRepository(Invoice).findOneBy({ id: invoiceId });
    if (!invoice) throw notFound('The invoice');
    const [customer, stop, lines, creditNotes] = await Promise.all([
      invoice.customerId ? manager.getRepository(Customer).findOneBy({ id: invoice.customerId }) : null,
      invoice.stopId ? manager.getRepository(Stop).findOneBy({ id: invoice.stopId }) : null,
      manager.getRepository(InvoiceLine).find({ where: { invoiceId }, order: { position: 'ASC' } }),
      manager.getRepository(CreditNote).find({ where: { invoiceId }, order: { createdAt: 'ASC', id: 'ASC' } }),
    ]);
    // The lines keep their tickets after a void releases them, so a void invoice still says what it billed.
    const ticketIds = [...new Set(lines.map((line) => line.ticketId).filter((id): id is string => id !== null))];
    const [tickets, payments] = await Promise.all([
      this.tickets(manager, ticketIds),
      manager.getRepository(Payment).find({
        // A draft shows the on-site payments of its tickets, which issuing attaches to it.
        where:
          invoice.status === 'draft' && ticketIds.length > 0
            ? [{ invoiceId }, { ticketId: In(ticketIds) }]
            : { invoiceId },
        order: { recordedAt: 'ASC', id: 'ASC' },
      }),
    ]);
    const summary = this.summary(invoice);
    const payable = (invoice.status === 'sent' || invoice.status === 'part-paid') && summary.balanceCents > 0;
    return {
      ...summary,
      customer: customer ? { id: customer.id, name: customer.name } : null,
      stop: stop ? { id: stop.id, name: stop.name } : null,
      billToEmail: invoice.billToEmail,
      billToAddress: invoice.billToAddress,
      termsDays: invoice.termsDays,
      discountBp: invoice.discountBp,
      discountCents: invoice.discountCents,
      linesCents: invoice.linesCents,
      discountTotalCents: invoice.discountTotalCents,
      subtotalCents: invoice.subtotalCents,
      taxCents: invoice.taxCents,
      taxGroups: invoice.taxGroups,
      paidCents: invoice.paidCents,
      creditedCents: invoice.creditedCents,
      notes: invoice.notes,
      voidReason: invoice.voidReason,
      voidedAt: invoice.voidedAt?.toISOString() ?? null,
      sentAt: invoice.sentAt?.toISOString() ?? null,
      version: invoice.version,
      lines: lines.map((line) => ({
        id: line.id,
        ticketId: line.ticketId,
        position: line.position,
        kind: line.kind,
        description: line.description,
        amountCents: line.amountCents,
        taxable: line.taxable,
        taxRateBp: line.taxRateBp,
      })),
      tickets,
      payments: payments.map((payment) => ({
        id: payment.id,
        method: payment.method,
        amountCents: payment.amountCents,
        reference: payment.reference,
        recordedAt: payment.recordedAt.toISOString(),
        onSite: payment.ticketId !== null,
      })),
      creditNotes: creditNotes.map((note) => ({
        id: note.id,
        number: note.number,
        amountCents: note.amountCents,
        reason: note.reason,
        refundMethod: note.refundMethod,
        createdAt: note.createdAt.toISOString(),
      })),
      payUrl: payable ? this.payLink.url(invoice.id) : null,
    };
  }

  private async tickets(manager: EntityManager, ids: string[]): Promise<InvoiceTicketDto[]> {
    if (ids.length === 0) return [];
    const rows = await manager.query<
      { id: string; visit_day: string; stop_name: string | null; customer_name: string; total_cents: number }[]
    >(
      `SELECT t.id, to_char(t.visit_day, 'YYYY-MM-DD') AS visit_day, s.name AS stop_name, c.name AS customer_name,
              t.total_cents
         FROM tickets t JOIN customers c ON c.id = t.customer_id LEFT JOIN stops s ON s.id = t.stop_id
        WHERE t.id = ANY($1::uuid[])
        ORDER BY t.visit_day, t.created_at, t.id`,
      [ids],
    );
    return rows.map((row) => ({
      id: row.id,
      visitDay: row.visit_day,
      stopName: row.stop_name,
      customerName: row.customer_name,
      totalCents: row.total_cents,
    }));
  }
}

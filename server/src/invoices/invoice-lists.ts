import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { BillingMode } from '@keenroute/shared';
import type { DataSource } from 'typeorm';
import { InvoiceAccess } from '../access/invoice-access';
import type { Actor } from '../auth/actor';
import { likePattern } from '../common/pagination.dto';
import type { InvoiceListDto, ReadyGroupDto } from './dto/invoice-response.dto';
import type { ListInvoicesQueryDto } from './dto/list-invoices-query.dto';
import { Invoice } from './entities/invoice.entity';
import { InvoiceReader } from './invoice-reader';
import { payerKey, payerOf } from './invoice-payer';

interface ReadyRow {
  id: string;
  visit_day: string;
  total_cents: number;
  paid_cents: number;
  currency: string;
  customer_id: string;
  stop_id: string | null;
  customer_name: string;
  customer_email: string | null;
  stop_name: string | null;
  stop_email: string | null;
  billing_mode: BillingMode | null;
}

/** The invoices list and the "ready to invoice" tickets, grouped by who pays. */
@Injectable()
export class InvoiceLists {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly access: InvoiceAccess,
    private readonly reader: InvoiceReader,
  ) {}

  async list(actor: Actor, query: ListInvoicesQueryDto): Promise<InvoiceListDto> {
    const today = this.reader.today();
    const builder = this.access.scopeInvoices(
      this.dataSource.getRepository(Invoice).createQueryBuilder('invoice'),
      actor,
      'invoice',
    );
    if (query.status) builder.andWhere('invoice.status = :status', { status: query.status });
    if (query.overdue !== undefined) {
      // The same rule as isOverdue, in SQL so paging counts right.
      const overdue = `coalesce(invoice.status IN ('sent', 'part-paid') AND invoice.due_date < :today
        AND invoice.total_cents - invoice.paid_cents - invoice.credited_cents > 0, false)`;
      builder.andWhere(query.overdue ? overdue : `NOT ${overdue}`, { today });
    }
    if (query.billTo) builder.andWhere('invoice.billTo = :billTo', { billTo: query.billTo });
    if (query.customerId) builder.andWhere('invoice.customerId = :customerId', { customerId: query.customerId });
    if (query.stopId) builder.andWhere('invoice.stopId = :stopId', { stopId: query.stopId });
    const q = query.q?.trim();
    if (q) {
      builder.andWhere('(invoice.number ILIKE :q OR invoice.billToName ILIKE :q)', { q: likePattern(q) });
    }
    const [invoices, total] = await builder
      .orderBy('invoice.createdAt', 'DESC')
      .addOrderBy('invoice.id', 'DESC')
      .skip((query.page - 1) * query.pageSize)
      .take(query.pageSize)
      .getManyAndCount();
    return {
      items: invoices.map((invoice) => this.reader.summary(invoice, today)),
      total,
      page: query.page,
      pageSize: query.pageSize,
    };
  }

  /** Finished tickets left for an invoice and on none yet, one group per payer (and currency), oldest visit first. */
  async ready(): Promise<ReadyGroupDto[]> {
    const rows = await this.dataSource.query<ReadyRow[]>(
      `SELECT t.id, to_char(t.visit_day, 'YYYY-MM-DD') AS visit_day, t.total_cents, t.currency, t.customer_id,
              t.stop_id, c.name AS customer_name, c.email AS customer_email, s.name AS stop_name,
              s.email AS stop_email, s.billing_mode,
              (SELECT coalesce(sum(p.amount_cents), 0)::int FROM payments p WHERE p.ticket_id = t.id) AS paid_cents
         FROM tickets t JOIN customers c ON c.id = t.customer_id LEFT JOIN stops s ON s.id = t.stop_id
        WHERE t.status IN ('finished', 'handed-back') AND t.settlement = 'to-invoice' AND t.invoice_id IS NULL
        ORDER BY t.visit_day, t.created_at, t.id`,
    );
    const groups = new Map<string, ReadyGroupDto>();
    for (const row of rows) {
      const payer = payerOf({ customerId: row.customer_id, stopId: row.stop_id }, row.billing_mode);
      const key = `${payerKey(payer)}:${row.currency}`;
      let group = groups.get(key);
      if (!group) {
        const byStop = payer.billTo === 'stop';
        group = {
          ...payer,
          name: byStop ? row.stop_name! : row.customer_name,
          email: byStop ? row.stop_email : row.customer_email,
          currency: row.currency,
          tickets: [],
          totalCents: 0,
          paidCents: 0,
        };
        groups.set(key, group);
      }
      group.tickets.push({
        id: row.id,
        visitDay: row.visit_day,
        stopName: row.stop_name,
        customerName: row.customer_name,
        totalCents: row.total_cents,
        paidCents: row.paid_cents,
      });
      group.totalCents += row.total_cents;
      group.paidCents += row.paid_cents;
    }
    return [...groups.values()].sort((a, b) => a.name.localeCompare(b.name) || a.currency.localeCompare(b.currency));
  }
}

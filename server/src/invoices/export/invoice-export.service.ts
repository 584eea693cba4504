import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import { DomainError } from '../../common/errors/domain-error';
import type { AppConfig } from '../../config/environment';
import type { InvoiceStatus } from '../entities/invoice.entity';
import { balanceCents } from '../invoice-balance';
import { decimalAmount, toCsv } from './csv-cells';
import type { ExportQueryDto } from './dto/export-query.dto';

export const INVOICE_COLUMNS = [
  'Number',
  'Status',
  'Issue date',
  'Due date',
  'Bill to',
  'Currency',
  'Subtotal',
  'Tax',
  'Total',
  'Paid',
  'Credited',
  'Balance',
] as const;
export const PAYMENT_COLUMNS = ['Date', 'Invoice number', 'Method', 'Reference', 'Amount'] as const;

export interface CsvFile {
  fileName: string;
  csv: string;
}

interface InvoiceRow {
  number: string;
  status: InvoiceStatus;
  issueDate: string;
  dueDate: string | null;
  billToName: string;
  currency: string;
  subtotalCents: number;
  taxCents: number;
  totalCents: number;
  paidCents: number;
  creditedCents: number;
}

interface PaymentRow {
  day: string;
  number: string | null;
  method: string;
  reference: string;
  amountCents: number;
  currency: string;
}

/** The range as SQL parameters, after checking it reads forwards. */
function range(query: ExportQueryDto): [string | null, string | null] {
  if (query.from && query.to && query.from > query.to) {
    throw new DomainError('invalid_input', `The range starts (${query.from}) after it ends (${query.to}).`, {
      from: ['from must be on or before to.'],
    });
  }
  return [query.from ?? null, query.to ?? null];
}

const rangeName = (query: ExportQueryDto) =>
  [query.from ? `from-${query.from}` : '', query.to ? `to-${query.to}` : ''].filter(Boolean).join('-');

/** Spreadsheets for the bookkeeper: issued invoices by issue date, and payments by the day they were received. */
@Injectable()
export class InvoiceExportService {
  private readonly timeZone: string;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    config: ConfigService<AppConfig, true>,
  ) {
    this.timeZone = config.get('BUSINESS_TIME_ZONE', { infer: true });
  }

  /** Every issued invoice (void ones too, with nothing owed), in number order within each issue date. Drafts are not. */
  async invoices(query: ExportQueryDto): Promise<CsvFile> {
    const rows = await this.dataSource.query<InvoiceRow[]>(
      `SELECT number, status, to_char(issue_date, 'YYYY-MM-DD') AS "issueDate",
              to_char(due_date, 'YYYY-MM-DD') AS "dueDate", bill_to_name AS "billToName", currency,
              subtotal_cents AS "subtotalCents", tax_cents AS "taxCents", total_cents AS "totalCents",
              paid_cents AS "paidCents", credited_cents AS "creditedCents"
         FROM invoices
        WHERE status <> 'draft' AND number IS NOT NULL
          AND ($1::date IS NULL OR issue_date >= $1::date) AND ($2::date IS NULL OR issue_date <= $2::date)
        ORDER BY issue_date, number`,
      range(query),
    );
    const csv = toCsv(
      INVOICE_COLUMNS,
      rows.map((row) => {
        const amount = (cents: number) => decimalAmount(cents, row.currency);
        return [
          row.number,
          row.status,
          row.issueDate,
          row.dueDate,
          row.billToName,
          row.currency,
          amount(row.subtotalCents),
          amount(row.taxCents),
          amount(row.totalCents),
          amount(row.paidCents),
          amount(row.creditedCents),
          amount(row.status === 'void' ? 0 : balanceCents(row)),
        ];
      }),
    );
    return { fileName: `keenroute-invoices${rangeName(query) ? `-${rangeName(query)}` : ''}.csv`, csv };
  }

  /** Every payment received, on site or against an invoice, by the business-time-zone day it was recorded. */
  async payments(query: ExportQueryDto): Promise<CsvFile> {
    const [from, to] = range(query);
    const rows = await this.dataSource.query<PaymentRow[]>(
      `SELECT to_char(p.recorded_at AT TIME ZONE $3, 'YYYY-MM-DD') AS day, i.number, p.method, p.reference,
              p.amount_cents AS "amountCents", coalesce(i.currency, t.currency, 'USD') AS currency
         FROM payments p
         LEFT JOIN invoices i ON i.id = p.invoice_id
         LEFT JOIN tickets t ON t.id = p.ticket_id
        WHERE ($1::date IS NULL OR (p.recorded_at AT TIME ZONE $3)::date >= $1::date)
          AND ($2::date IS NULL OR (p.recorded_at AT TIME ZONE $3)::date <= $2::date)
        ORDER BY p.recorded_at, p.id`,
      [from, to, this.timeZone],
    );
    const csv = toCsv(
      PAYMENT_COLUMNS,
      rows.map((row) => [row.day, row.number, row.method, row.reference, decimalAmount(row.amountCents, row.currency)]),
    );
    return { fileName: `keenroute-payments${rangeName(query) ? `-${rangeName(query)}` : ''}.csv`, csv };
  }
}

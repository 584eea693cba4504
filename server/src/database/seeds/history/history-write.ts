/** Writes the history in bulk, parents before children, and moves the registry's dates back to where it begins. */
import type { EntityManager } from 'typeorm';
import { CreditNote } from '../../../invoices/entities/credit-note.entity';
import { InvoiceLine } from '../../../invoices/entities/invoice-line.entity';
import { InvoiceReminder } from '../../../invoices/entities/invoice-reminder.entity';
import { Invoice } from '../../../invoices/entities/invoice.entity';
import { Payment } from '../../../payments/entities/payment.entity';
import { RouteDayStop } from '../../../route-days/entities/route-day-stop.entity';
import { RouteDay } from '../../../route-days/entities/route-day.entity';
import { ShearHistoryEntry } from '../../../shears/entities/shear-history-entry.entity';
import { StopVisit } from '../../../stops/entities/stop-visit.entity';
import { TicketLineOverride } from '../../../tickets/entities/ticket-line-override.entity';
import { TicketLine } from '../../../tickets/entities/ticket-line.entity';
import { Ticket } from '../../../tickets/entities/ticket.entity';
import { chunksOf } from '../../../imports/in-chunks';
import type { CreditNoteRow, PaymentRow, ReminderRow } from './history-collections';
import type { RouteDayRow, RouteDayStopRow } from './history-route-days';
import type { TicketRows } from './history-rows';
import { insertRows } from './insert-rows';

export interface HistoryRows {
  visits: Omit<StopVisit, never>[];
  routeDays: RouteDayRow[];
  routeDayStops: RouteDayStopRow[];
  invoices: Omit<Invoice, 'version'>[];
  invoiceLines: InvoiceLine[];
  tickets: TicketRows;
  payments: PaymentRow[];
  credits: CreditNoteRow[];
  reminders: ReminderRow[];
  counters: Map<string, number>;
}

/** The registry dates the history moves back: who was where since when, and when each pair and stop was first seen. */
export interface RegistryMoves {
  spans: { id: string; customerId: string; startedAt: Date }[];
  registrations: { shearId: string; day: string; at: Date; summary: string; recordedBy: string }[];
  stops: { id: string; createdAt: Date }[];
}

/** UPDATE … FROM unnest(one array per column), in chunks. */
async function updateFrom(manager: EntityManager, sql: string, columns: readonly unknown[][]): Promise<void> {
  const rows = columns[0]?.length ?? 0;
  for (let start = 0; start < rows; start += 5000) {
    await manager.query(
      sql,
      columns.map((column) => column.slice(start, start + 5000)),
    );
  }
}

export async function writeHistory(manager: EntityManager, rows: HistoryRows, moves: RegistryMoves): Promise<void> {
  await insertRows(manager, StopVisit, rows.visits);
  await insertRows(manager, RouteDay, rows.routeDays);
  await insertRows(manager, RouteDayStop, rows.routeDayStops);
  await insertRows(manager, Invoice, rows.invoices);
  await insertRows(manager, Ticket, rows.tickets.tickets);
  await insertRows(manager, TicketLine, rows.tickets.lines);
  await insertRows(manager, TicketLineOverride, rows.tickets.overrides);
  await insertRows(manager, InvoiceLine, rows.invoiceLines);
  await insertRows(manager, CreditNote, rows.credits);
  await insertRows(manager, Payment, rows.payments);
  await insertRows(manager, InvoiceReminder, rows.reminders);
  await insertRows(manager, ShearHistoryEntry, rows.tickets.serviced);
  const linked = rows.tickets.linked;
  await updateFrom(
    manager,
    `UPDATE shear_history h SET ticket_id = x.ticket_id FROM unnest($1::uuid[], $2::uuid[]) AS x(id, ticket_id)
      WHERE h.id = x.id`,
    [linked.map((row) => row.id), linked.map((row) => row.ticketId)],
  );
  await moveRegistry(manager, moves);
  for (const chunk of chunksOf([...rows.counters], 500)) {
    await manager.query(
      `INSERT INTO document_counters (series, year, last_number)
       SELECT split_part(key, '-', 1), split_part(key, '-', 2)::smallint, n FROM unnest($1::text[], $2::int[]) AS x(key, n)
       ON CONFLICT (series, year) DO UPDATE SET last_number = GREATEST(document_counters.last_number, EXCLUDED.last_number)`,
      [chunk.map(([key]) => key), chunk.map(([, n]) => n)],
    );
  }
}

async function moveRegistry(manager: EntityManager, moves: RegistryMoves): Promise<void> {
  const { spans, registrations, stops } = moves;
  await updateFrom(
    manager,
    `UPDATE customer_stop_history h SET started_at = x.started_at
       FROM unnest($1::uuid[], $2::timestamptz[]) AS x(id, started_at) WHERE h.id = x.id`,
    [spans.map((s) => s.id), spans.map((s) => s.startedAt)],
  );
  await updateFrom(
    manager,
    `UPDATE customers c SET created_at = least(c.created_at, x.started_at)
       FROM unnest($1::uuid[], $2::timestamptz[]) AS x(id, started_at) WHERE c.id = x.id`,
    [spans.map((s) => s.customerId), spans.map((s) => s.startedAt)],
  );
  await updateFrom(
    manager,
    `UPDATE shear_history h SET happened_on = x.day, summary = x.summary, recorded_by = x.recorded_by
       FROM unnest($1::uuid[], $2::date[], $3::text[], $4::uuid[]) AS x(shear_id, day, summary, recorded_by)
      WHERE h.shear_id = x.shear_id AND h.kind = 'registered'`,
    [
      registrations.map((r) => r.shearId),
      registrations.map((r) => r.day),
      registrations.map((r) => r.summary),
      registrations.map((r) => r.recordedBy),
    ],
  );
  await updateFrom(
    manager,
    `UPDATE shears s SET created_at = x.at FROM unnest($1::uuid[], $2::timestamptz[]) AS x(id, at) WHERE s.id = x.id`,
    [registrations.map((r) => r.shearId), registrations.map((r) => r.at)],
  );
  await updateFrom(
    manager,
    `UPDATE stops s SET created_at = least(s.created_at, x.at) FROM unnest($1::uuid[], $2::timestamptz[]) AS x(id, at)
      WHERE s.id = x.id`,
    [stops.map((s) => s.id), stops.map((s) => s.createdAt)],
  );
}

/**
 * The money of the history: what was paid at the chair (cash, cheque, card on the terminal, the day of the visit) and
 * how the invoices were paid since: mostly within terms, some late, a few part-paid, some still open at every age of
 * the receivables ageing, one credit note. Reminders went out at the business profile's days while one was owed.
 */
import { randomUUID } from 'node:crypto';
import { addDays, daysBetween, taxCents } from '@keenroute/shared';
import type { CreditNote } from '../../../invoices/entities/credit-note.entity';
import type { InvoiceReminder } from '../../../invoices/entities/invoice-reminder.entity';
import { statusFromMoney } from '../../../invoices/invoice-balance';
import type { InvoiceStatus } from '../../../invoices/entities/invoice.entity';
import { formatDocumentNumber } from '../../../invoices/invoice-numbering';
import type { Payment, PaymentMethod } from '../../../payments/entities/payment.entity';
import type { DemoRandom } from '../demo-random';
import type { BusinessClock } from './business-time';
import type { PlannedInvoice } from './history-invoices';
import type { PlannedTicket } from './history-tickets';

export type PaymentRow = Omit<Payment, 'receiptSentAt'>;
export type CreditNoteRow = CreditNote;
export type ReminderRow = InvoiceReminder;

export interface InvoiceMoney {
  paidCents: number;
  creditedCents: number;
  status: InvoiceStatus;
  /** The day the last payment or credit came in. */
  lastMoneyOn: string | null;
}

export interface Collections {
  payments: PaymentRow[];
  credits: CreditNoteRow[];
  reminders: ReminderRow[];
  money: Map<string, InvoiceMoney>;
  counters: Map<string, number>;
}

export interface CollectionOptions {
  /** The history's last day: nothing is paid after it. */
  end: string;
  /** The day the ageing is read on (the seed's today). */
  today: string;
  reminderDays: readonly number[];
  officeId: string;
  clock: BusinessClock;
  /** When each ticket was handed back: its on-site payment is taken then. */
  handedBackAt: ReadonlyMap<string, Date>;
  counters: ReadonlyMap<string, number>;
}

const ON_SITE: readonly (readonly [PaymentMethod, number])[] = [
  ['cash', 45],
  ['card-terminal', 40],
  ['cheque', 15],
];
const ON_INVOICE: readonly (readonly [PaymentMethod, number])[] = [
  ['cheque', 35],
  ['online', 30],
  ['cash', 20],
  ['card-terminal', 15],
];
/** The receivables ageing's buckets by days past due (the first: not due yet); each gets a few open invoices. */
const AGEING: readonly (readonly [number, number])[] = [
  [-1000, 0],
  [1, 30],
  [31, 60],
  [61, 90],
  [91, 1000],
];
const OPEN_PER_BUCKET = 2;
const PART_PAID_OPEN = 2;

interface Planned {
  day: string;
  amountCents: number;
}

export class Collector {
  private readonly payments: PaymentRow[] = [];

  constructor(
    private readonly rng: DemoRandom,
    private readonly options: CollectionOptions,
  ) {}

  collect(tickets: readonly PlannedTicket[], invoices: readonly PlannedInvoice[]): Collections {
    for (const ticket of tickets) {
      // A ticket done free (a price set to nothing) is settled with no money taken.
      if (ticket.settlement !== 'paid-on-site' || ticket.totals.totalCents === 0) continue;
      const at = this.options.handedBackAt.get(ticket.id)!;
      this.payments.push(
        this.payment(this.rng.weighted(ON_SITE), ticket.totals.totalCents, at, ticket.visit.sharpenerId, {
          ticketId: ticket.id,
        }),
      );
    }
    const issued = invoices.filter((invoice) => invoice.void === null);
    const plans = new Map(issued.map((invoice) => [invoice.id, this.schedule(invoice)]));
    const credited = this.creditOne(issued, plans);
    this.keepSomeOpen(issued, plans, credited);

    const money = new Map<string, InvoiceMoney>();
    const reminders: ReminderRow[] = [];
    for (const invoice of invoices) {
      const plan = plans.get(invoice.id) ?? [];
      const credit = credited?.invoice === invoice ? credited.row : null;
      for (const part of plan) {
        const method = this.rng.weighted(ON_INVOICE);
        const at = this.options.clock.at(part.day, this.rng.int(9 * 60, 16 * 60));
        this.payments.push(
          this.payment(method, part.amountCents, at, method === 'online' ? null : this.options.officeId, {
            invoiceId: invoice.id,
          }),
        );
      }
      const paidCents = plan.reduce((sum, part) => sum + part.amountCents, 0);
      const creditedCents = credit?.amountCents ?? 0;
      const status = statusFromMoney({
        status: invoice.void ? 'void' : 'sent',
        totalCents: invoice.price.totalCents,
        paidCents,
        creditedCents,
        dueDate: invoice.dueDate,
      });
      const days = [...plan.map((part) => part.day), ...(credit ? [credited!.on] : [])];
      money.set(invoice.id, { paidCents, creditedCents, status, lastMoneyOn: days.sort().at(-1) ?? null });
      if (!invoice.void) reminders.push(...this.reminders(invoice, plan, creditedCents));
    }
    return {
      payments: this.payments,
      credits: credited ? [credited.row] : [],
      reminders,
      money,
      counters: credited?.counters ?? new Map(this.options.counters),
    };
  }

  /** When the invoice is paid: mostly within terms, some late, now and then in two parts or not yet at all. */
  private schedule(invoice: PlannedInvoice): Planned[] {
    const total = invoice.price.totalCents;
    const terms = invoice.termsDays;
    const roll = this.rng.float();
    let parts: Planned[];
    if (roll < 0.04) {
      const first = Math.round(total * (0.3 + this.rng.float() * 0.3));
      const firstDay = addDays(invoice.issueDate, this.rng.int(3, terms + 20));
      parts = [{ day: firstDay, amountCents: first }];
      if (this.rng.chance(0.85))
        parts.push({ day: addDays(firstDay, this.rng.int(20, 70)), amountCents: total - first });
    } else if (roll < 0.046) {
      parts = [];
    } else {
      const delay =
        roll < 0.7 ? this.rng.int(0, terms) : roll < 0.92 ? terms + this.rng.int(1, 40) : terms + this.rng.int(41, 130);
      parts = [{ day: addDays(invoice.issueDate, delay), amountCents: total }];
    }
    return parts.filter((part) => part.day <= this.options.end && part.amountCents > 0);
  }

  /** A pair came back with a nick: one paid invoice gets a credit note for that line, and the rest was paid. */
  private creditOne(issued: readonly PlannedInvoice[], plans: Map<string, Planned[]>) {
    const { end } = this.options;
    const candidates = issued.filter(
      (invoice) =>
        invoice.issueDate >= addDays(end, -150) &&
        invoice.issueDate <= addDays(end, -45) &&
        invoice.lines.filter((line) => line.kind === 'shear').length >= 2,
    );
    if (candidates.length === 0) return null;
    const invoice = this.rng.pick(candidates);
    const line = invoice.lines.find((l) => l.kind === 'shear')!;
    const amountCents = Math.min(
      invoice.price.totalCents,
      line.amountCents + (line.taxable ? taxCents(line.amountCents, line.taxRateBp) : 0),
    );
    const on = addDays(invoice.issueDate, 4);
    const year = Number(on.slice(0, 4));
    const counters = new Map(this.options.counters);
    const next = (counters.get(`CN-${year}`) ?? 0) + 1;
    counters.set(`CN-${year}`, next);
    plans.set(
      invoice.id,
      invoice.price.totalCents > amountCents
        ? [
            {
              day: addDays(on, this.rng.int(2, invoice.termsDays)),
              amountCents: invoice.price.totalCents - amountCents,
            },
          ]
        : [],
    );
    const row: CreditNoteRow = {
      id: randomUUID(),
      number: formatDocumentNumber('CN', year, next),
      invoiceId: invoice.id,
      amountCents,
      reason:
        `${line.description.split(': ').slice(-1)[0]}: came back with a nick at the tip; credited and re-sharpened free at the next visit.`.slice(
          0,
          500,
        ),
      refundMethod: 'none',
      createdBy: this.options.officeId,
      createdAt: this.options.clock.at(on, 10 * 60),
    };
    return { invoice, row, counters, on };
  }

  /** Every ageing bucket holds a few open invoices, and a few are part-paid, so the receivables report has them all. */
  private keepSomeOpen(
    issued: readonly PlannedInvoice[],
    plans: Map<string, Planned[]>,
    credited: { invoice: PlannedInvoice } | null,
  ): void {
    const owed = (invoice: PlannedInvoice) =>
      invoice.price.totalCents - (plans.get(invoice.id) ?? []).reduce((sum, part) => sum + part.amountCents, 0);
    const pastDue = (invoice: PlannedInvoice) => daysBetween(invoice.dueDate, this.options.today);
    for (const [low, high] of AGEING) {
      const inBucket = issued.filter(
        (invoice) => invoice !== credited?.invoice && pastDue(invoice) >= low && pastDue(invoice) <= high,
      );
      const open = inBucket.filter((invoice) => owed(invoice) > 0).length;
      const paid = this.rng.shuffled(inBucket.filter((invoice) => owed(invoice) === 0));
      for (const invoice of paid.slice(0, Math.max(0, OPEN_PER_BUCKET - open))) plans.set(invoice.id, []);
    }
    const partPaid = issued.filter((invoice) => owed(invoice) > 0 && (plans.get(invoice.id) ?? []).length > 0);
    const unpaid = this.rng.shuffled(
      issued.filter(
        (invoice) =>
          (plans.get(invoice.id) ?? []).length === 0 && invoice !== credited?.invoice && pastDue(invoice) > 0,
      ),
    );
    for (const invoice of unpaid.slice(0, Math.max(0, PART_PAID_OPEN - partPaid.length))) {
      const day = addDays(invoice.issueDate, this.rng.int(5, invoice.termsDays + 10));
      if (day <= this.options.end)
        plans.set(invoice.id, [{ day, amountCents: Math.round(invoice.price.totalCents / 2) }]);
    }
  }

  /** The reminders the daily run sent while something was owed (one that had no address to go to failed). */
  private reminders(invoice: PlannedInvoice, plan: readonly Planned[], creditedCents: number): ReminderRow[] {
    const rows: ReminderRow[] = [];
    for (const stageDays of [...new Set(this.options.reminderDays)].sort((a, b) => a - b)) {
      const on = addDays(invoice.dueDate, stageDays);
      if (on > this.options.end) break;
      const paidBy = plan.filter((part) => part.day < on).reduce((sum, part) => sum + part.amountCents, 0);
      if (paidBy + creditedCents >= invoice.price.totalCents) break;
      const at = this.options.clock.at(on, 7 * 60);
      const email = invoice.snapshot.billToEmail;
      rows.push({
        id: randomUUID(),
        invoiceId: invoice.id,
        stageDays,
        status: email ? 'sent' : 'failed',
        attempts: 1,
        lastError: email ? null : `Invoice ${invoice.number} has no e-mail address to send a reminder to.`,
        createdAt: at,
        sentAt: email ? at : null,
      });
    }
    return rows;
  }

  private payment(
    method: PaymentMethod,
    amountCents: number,
    at: Date,
    recordedBy: string | null,
    target: { ticketId?: string; invoiceId?: string },
  ): PaymentRow {
    const externalId = method === 'online' ? `pi_demo_${randomUUID().replace(/-/g, '').slice(0, 24)}` : null;
    const reference =
      method === 'cheque'
        ? String(this.rng.int(1001, 9899))
        : method === 'card-terminal'
          ? `TRM-${String(this.rng.int(0, 999_999)).padStart(6, '0')}`
          : (externalId ?? '');
    return {
      id: randomUUID(),
      ticketId: target.ticketId ?? null,
      invoiceId: target.invoiceId ?? null,
      method,
      amountCents,
      reference,
      externalId,
      recordedBy,
      recordedAt: at,
    };
  }
}

/**
 * The invented past of the demo (and, scaled up, of the report benchmark's dataset): years of worked stop visits at
 * each stop's cadence, their route days, tickets priced by the rules package, payments at the chair and invoices paid
 * since. Built in memory from the registry as it stands, then written in bulk in the caller's transaction.
 */
import { randomUUID } from 'node:crypto';
import { addDays, benchMinutes, daysBetween, DEFAULT_BENCH_MINUTES, pairBenchMinutes } from '@keenroute/shared';
import type { EntityManager } from 'typeorm';
import { DemoRandom } from '../demo-random';
import { BusinessClock } from './business-time';
import { Collector } from './history-collections';
import { buildInvoices } from './history-invoices';
import type { HistoryOptions, HistoryScale } from './history-options';
import { buildRouteDays, visitKey, type WorkedStop } from './history-route-days';
import { invoiceRows, ticketRows, type TicketTimes } from './history-rows';
import { loadHistorySource, type HistorySource } from './history-source';
import { TicketMaker, type PlannedTicket, type TicketChances } from './history-tickets';
import { VisitPlanner, type PlannedVisit } from './history-visits';
import { writeHistory, type RegistryMoves } from './history-write';

/** A database with worked tickets this old already has a past: the history is added only where there is none. */
const RECENT_DAYS = 14;
/** 23:59, the latest a ticket of the day can be stamped. */
const LAST_MINUTE = 24 * 60 - 1;

export interface HistoryCounts {
  from: string;
  to: string;
  visits: number;
  routeDays: number;
  tickets: number;
  ticketLines: number;
  invoices: number;
  payments: number;
  creditNotes: number;
}

export async function historyIsMissing(manager: EntityManager, today: string): Promise<boolean> {
  const [row] = await manager.query<{ exists: boolean }[]>(
    `SELECT EXISTS (SELECT 1 FROM tickets WHERE visit_day < $1::date) AS exists`,
    [addDays(today, -RECENT_DAYS)],
  );
  return !row?.exists;
}

/**
 * Who was at each stop before the records begin: most of those there at the first recorded visit had been there
 * all along (from before the history starts), the rest joined during it. Those who joined later are left alone.
 */
function extendSpans(rng: DemoRandom, source: HistorySource, start: string): RegistryMoves['spans'] {
  const firstRecorded = new Map<string, string>();
  for (const visit of source.visits) if (!firstRecorded.has(visit.stopId)) firstRecorded.set(visit.stopId, visit.day);
  const moved: RegistryMoves['spans'] = [];
  for (const customer of source.customers) {
    const first = customer.spans.reduce((a, b) => (b.from < a.from ? b : a));
    const recorded = firstRecorded.get(first.stopId);
    if (recorded === undefined || first.from > recorded || first.from <= start) continue;
    first.from = rng.chance(0.8)
      ? addDays(start, -rng.int(0, 365))
      : addDays(start, rng.int(0, daysBetween(start, first.from)));
    moved.push({ id: first.rowId, customerId: customer.id, startedAt: new Date(`${first.from}T15:00:00Z`) });
  }
  return moved;
}

/** The pairs registered with each customer's first ones: seen at earlier visits too, once the history reaches back. */
function firstPairs(source: HistorySource): Set<string> {
  const first = new Map<string, string>();
  for (const shear of source.shears) {
    const day = first.get(shear.customerId);
    if (day === undefined || shear.registeredOn < day) first.set(shear.customerId, shear.registeredOn);
  }
  return new Set(source.shears.filter((s) => s.registeredOn === first.get(s.customerId)).map((s) => s.id));
}

/** The line chance that lands near targetLines, from the pairs that could come in at each visit. */
function lineChanceFor(scale: HistoryScale, candidatePairs: number, recordedLines: number): number {
  if (scale.targetLines === undefined || candidatePairs === 0) return scale.lineChance;
  const wanted = (scale.targetLines - recordedLines) / (candidatePairs * scale.ticketChance);
  return Math.min(1, Math.max(0.02, wanted));
}

/** In-service pairs of the customers at each stop now. */
function stopPairs(source: HistorySource): Map<string, number> {
  const current = new Map<string, string>();
  for (const customer of source.customers) {
    const open = customer.spans.find((span) => span.to === null);
    if (open) current.set(customer.id, open.stopId);
  }
  const pairs = new Map<string, number>();
  for (const shear of source.shears) {
    const stopId = current.get(shear.customerId);
    if (stopId && shear.statusOn === null) pairs.set(stopId, (pairs.get(stopId) ?? 0) + 1);
  }
  return pairs;
}

/** Bench minutes a visit is expected to take: the setup and about a quarter hour a pair brought in. */
function expectedBench(source: HistorySource, pairs: ReadonlyMap<string, number>, chances: TicketChances) {
  return new Map(
    source.stops.map((stop) => [
      stop.id,
      DEFAULT_BENCH_MINUTES.setupPerStop + Math.round((pairs.get(stop.id) ?? 0) * chances.ticket * chances.line * 15),
    ]),
  );
}

/** Each ticket's times on its visit: opened as the sharpener reaches the customer, done pair by pair. */
function ticketTimes(
  tickets: readonly PlannedTicket[],
  slot: { routeDayId: string; start: number; leave: number },
  clock: BusinessClock,
  into: Map<string, TicketTimes>,
): void {
  let t = slot.start + DEFAULT_BENCH_MINUTES.setupPerStop;
  tickets.forEach((ticket, index) => {
    const work = ticket.lines.reduce(
      (sum, line) =>
        sum +
        pairBenchMinutes({
          edgeType: line.shear.edgeType,
          toolKind: line.shear.toolKind,
          insideEdge: line.addOns.includes('inside-edge-hone'),
        }),
      0,
    );
    const day = ticket.visit.day;
    const finished = Math.min(t + work, slot.leave);
    // A day the registry piled too many visits on runs late on paper; its tickets still belong to that day.
    const time = (minutes: number) => clock.at(day, Math.min(minutes, LAST_MINUTE));
    into.set(ticket.id, {
      routeDayId: slot.routeDayId,
      openedAt: time(Math.min(slot.start + index, slot.leave)),
      finishedAt: time(finished),
      handedBackAt: time(Math.min(finished + 2, slot.leave)),
    });
    t = finished;
  });
}

export async function seedHistory(manager: EntityManager, options: HistoryOptions): Promise<HistoryCounts> {
  const source = await loadHistorySource(manager, options);
  const { scale } = options;
  const rng = new DemoRandom(options.seed);
  const clock = new BusinessClock(options.timeZone);
  const end = source.end;
  const start = addDays(end, -Math.round(scale.years * 365));
  const sharpeners = [
    ...new Set([
      ...source.stops.flatMap((stop) => (stop.assignedSharpenerId ? [stop.assignedSharpenerId] : [])),
      ...source.visits.flatMap((visit) => (visit.sharpenerId ? [visit.sharpenerId] : [])),
    ]),
  ].sort();
  const counts: HistoryCounts = {
    from: start,
    to: end,
    visits: 0,
    routeDays: 0,
    tickets: 0,
    ticketLines: 0,
    invoices: 0,
    payments: 0,
    creditNotes: 0,
  };
  if (sharpeners.length === 0 || source.stops.length === 0) return counts;

  const spanMoves = extendSpans(rng, source, start);
  const maker = new TicketMaker(
    rng,
    source.card.card,
    source.customers,
    source.shears,
    source.serviced,
    firstPairs(source),
  );
  // Before the visits exist, the line chance is guessed from each stop's pairs and cadence; refined once they do.
  const pairsAt = stopPairs(source);
  const roughCandidates = source.stops.reduce(
    (sum, stop) => sum + ((pairsAt.get(stop.id) ?? 0) * scale.years * 365) / (stop.cadenceWeeks * 7),
    0,
  );
  const rough = { ticket: scale.ticketChance, line: lineChanceFor(scale, roughCandidates, 0) };
  const planner = new VisitPlanner(
    rng,
    scale,
    { start, end, workWeekdays: source.settings.workWeekdays },
    sharpeners,
    expectedBench(source, pairsAt, rough),
  );
  const visits = planner.plan(source.stops, source.visits);
  const candidates = visits
    .filter((visit) => !visit.recorded)
    .reduce(
      (sum, visit) => sum + maker.eligible(visit.stopId, visit.day).reduce((n, entry) => n + entry.shears.length, 0),
      0,
    );
  const recordedLines = source.serviced.filter((entry) => entry.day >= start && entry.day <= end).length;
  const chances = { ticket: scale.ticketChance, line: lineChanceFor(scale, candidates, recordedLines) };

  const stopById = new Map(source.stops.map((stop) => [stop.id, stop]));
  const worked: { visit: PlannedVisit; tickets: PlannedTicket[] }[] = [];
  for (const visit of visits) {
    const tickets = maker.tickets(visit, stopById.get(visit.stopId)!, chances);
    // A visit the registry did not record happened only if someone had shears done.
    if (tickets.length > 0 || visit.recorded) worked.push({ visit, tickets });
  }
  const route = buildRouteDays(
    worked.map(({ visit, tickets }): WorkedStop => ({
      stop: stopById.get(visit.stopId)!,
      day: visit.day,
      sharpenerId: visit.sharpenerId,
      benchMinutes: benchMinutes(
        tickets.flatMap((ticket) =>
          ticket.lines.map((line) => ({
            edgeType: line.shear.edgeType,
            toolKind: line.shear.toolKind,
            insideEdge: line.addOns.includes('inside-edge-hone'),
          })),
        ),
      ),
    })),
    source.settings,
    clock,
  );
  const times = new Map<string, TicketTimes>();
  for (const { visit, tickets } of worked)
    ticketTimes(tickets, route.slots.get(visitKey(visit.stopId, visit.day))!, clock, times);
  const tickets = worked.flatMap((entry) => entry.tickets);

  const book = buildInvoices(rng, tickets, { end, termsDays: source.termsDays, counters: source.counters });
  const invoiceOf = new Map<string, string>();
  for (const invoice of book.invoices)
    if (!invoice.void) for (const t of invoice.tickets) invoiceOf.set(t.id, invoice.id);
  const collections = new Collector(rng, {
    end,
    today: options.today,
    reminderDays: source.reminderDays,
    officeId: source.officeId,
    clock,
    handedBackAt: new Map([...times].map(([id, t]) => [id, t.handedBackAt])),
    counters: book.counters,
  }).collect(tickets, book.invoices);

  const rows = ticketRows(tickets, times, invoiceOf, { rateCardVersion: source.card.version, ownerId: source.ownerId });
  await writeHistory(
    manager,
    {
      visits: worked
        .filter(({ visit }) => !visit.recorded)
        .map(({ visit }) => ({
          id: randomUUID(),
          stopId: visit.stopId,
          workedOn: visit.day,
          sharpenerId: visit.sharpenerId,
          createdAt: clock.at(visit.day, 18 * 60),
        })),
      routeDays: route.days,
      routeDayStops: route.stops,
      invoices: invoiceRows(book.invoices, collections.money, { officeId: source.officeId, clock }),
      invoiceLines: book.invoices.flatMap((invoice) =>
        invoice.lines.map((line) => ({ ...line, invoiceId: invoice.id })),
      ),
      tickets: rows,
      payments: collections.payments,
      credits: collections.credits,
      reminders: collections.reminders,
      counters: collections.counters,
    },
    { spans: spanMoves, registrations: registrationMoves(tickets, source), stops: stopMoves(rng, worked) },
  );
  return {
    ...counts,
    visits: worked.length,
    routeDays: route.days.length,
    tickets: tickets.length,
    ticketLines: rows.lines.length,
    invoices: book.invoices.length,
    payments: collections.payments.length,
    creditNotes: collections.credits.length,
  };
}

/** A pair first worked on before the day it was registered was registered at that first ticket instead. */
function registrationMoves(tickets: readonly PlannedTicket[], source: HistorySource): RegistryMoves['registrations'] {
  const first = new Map<string, PlannedTicket>();
  for (const ticket of tickets) {
    for (const line of ticket.lines) {
      const seen = first.get(line.shear.id);
      if (!seen || ticket.visit.day < seen.visit.day) first.set(line.shear.id, ticket);
    }
  }
  return source.shears.flatMap((shear) => {
    const ticket = first.get(shear.id);
    if (!ticket || ticket.visit.day >= shear.registeredOn) return [];
    return [
      {
        shearId: shear.id,
        day: ticket.visit.day,
        at: new Date(`${ticket.visit.day}T15:00:00Z`),
        summary: `Registered at ${ticket.stop.name}.`,
        recordedBy: ticket.visit.sharpenerId,
      },
    ];
  });
}

/** A stop was entered a little before its first visit. */
function stopMoves(rng: DemoRandom, worked: readonly { visit: PlannedVisit }[]): RegistryMoves['stops'] {
  const first = new Map<string, string>();
  for (const { visit } of worked)
    if (!first.has(visit.stopId) || visit.day < first.get(visit.stopId)!) first.set(visit.stopId, visit.day);
  return [...first].map(([id, day]) => ({ id, createdAt: new Date(`${addDays(day, -rng.int(3, 30))}T15:00:00Z`) }));
}

/**
 * The tickets of each history visit: which customers had shears done and which of their shears, priced by the rules
 * package exactly as the ticket service prices them (priceLines: priceTicket, then any price set by hand). At a visit
 * the registry already recorded, the tickets are the shears its history says were serviced that day.
 */
import { randomUUID } from 'node:crypto';
import { isToothed, type AddOnCode, type RateCard } from '@keenroute/shared';
import { applyOverrides, priceLines, type TicketTotals } from '../../../tickets/ticket-pricing';
import type { DemoRandom } from '../demo-random';
import type { HistoryCustomer, HistoryShear, HistoryStop, ServicedEntry } from './history-source';
import type { PlannedVisit } from './history-visits';

export interface PlannedLine {
  id: string;
  shear: HistoryShear;
  addOns: AddOnCode[];
  priceCents: number;
  explanation: string;
  overrideCents: number | null;
  overrideReason: string | null;
  /** The registry's serviced row this line stands behind; null when the line writes its own. */
  servicedEntryId: string | null;
}

export type HistorySettlement = 'paid-on-site' | 'to-invoice';

export interface PlannedTicket {
  id: string;
  visit: PlannedVisit;
  stop: HistoryStop;
  customer: HistoryCustomer;
  chargeTrip: boolean;
  lines: PlannedLine[];
  totals: TicketTotals;
  settlement: HistorySettlement;
}

export interface TicketChances {
  ticket: number;
  line: number;
}

/** Add-ons done now and then, with how often (common practice at the bench; invented shares). */
const ADD_ON_CHANCES: readonly { code: AddOnCode; chance: number; applies: (shear: HistoryShear) => boolean }[] = [
  {
    code: 'inside-edge-hone',
    chance: 0.3,
    applies: (s) => (s.edgeType === 'convex' || s.edgeType === 'semi-convex') && !isToothed(s.toolKind),
  },
  { code: 'tension-adjustment', chance: 0.1, applies: () => true },
  { code: 'bumper-replacement', chance: 0.03, applies: () => true },
  { code: 'tip-realignment', chance: 0.02, applies: () => true },
  { code: 'set-screw-replacement', chance: 0.015, applies: () => true },
  { code: 'blade-polish', chance: 0.04, applies: (s) => s.use === 'hair' },
];

/** What the registry's service summaries say was done, as add-ons. */
const SUMMARY_ADD_ONS: readonly [string, AddOnCode][] = [
  ['inside edge honed', 'inside-edge-hone'],
  ['tension set', 'tension-adjustment'],
  ['pivot cleaned and oiled', 'tension-adjustment'],
];

/** A price set by hand, about one line in a hundred, with the reason the owner gave. */
const OVERRIDE_CHANCE = 0.01;
const OVERRIDES: readonly { reason: string; cents: (rules: number) => number }[] = [
  { reason: 'Done again at no charge: the edge rolled within a week of the last visit.', cents: () => 0 },
  { reason: "A regular's price agreed with the owner.", cents: (rules) => Math.max(0, rules - 500) },
  { reason: 'Rounded down to the dollar five at the chair.', cents: (rules) => Math.floor(rules / 500) * 500 },
];

/** A customer who asks for an invoice is usually invoiced every time; most pay on the day. */
const PREFERS_INVOICE = 0.2;

type Override = (typeof OVERRIDES)[number];
type DraftLine = Pick<PlannedLine, 'id' | 'shear' | 'addOns' | 'servicedEntryId'> & { override: Override | null };
interface Work {
  customer: HistoryCustomer;
  lines: DraftLine[];
}

const covers = (span: { from: string; to: string | null }, day: string) =>
  span.from <= day && (span.to === null || day < span.to);

export class TicketMaker {
  private readonly atStop = new Map<string, { customer: HistoryCustomer; from: string; to: string | null }[]>();
  private readonly shearsOf = new Map<string, HistoryShear[]>();
  private readonly shearById = new Map<string, HistoryShear>();
  private readonly customerById = new Map<string, HistoryCustomer>();
  private readonly servicedOn = new Map<string, ServicedEntry[]>();
  private readonly prefersInvoice = new Map<string, boolean>();

  constructor(
    private readonly rng: DemoRandom,
    private readonly card: RateCard,
    customers: readonly HistoryCustomer[],
    shears: readonly HistoryShear[],
    serviced: readonly ServicedEntry[],
    /** The shears a history may back-date: registered with the customer's first pairs, before any record. */
    private readonly backdatable: ReadonlySet<string>,
  ) {
    for (const customer of customers) {
      this.customerById.set(customer.id, customer);
      for (const span of customer.spans) {
        const list = this.atStop.get(span.stopId) ?? [];
        list.push({ customer, from: span.from, to: span.to });
        this.atStop.set(span.stopId, list);
      }
    }
    for (const shear of shears) {
      this.shearById.set(shear.id, shear);
      this.shearsOf.set(shear.customerId, [...(this.shearsOf.get(shear.customerId) ?? []), shear]);
    }
    for (const entry of serviced) this.servicedOn.set(entry.day, [...(this.servicedOn.get(entry.day) ?? []), entry]);
  }

  /** The customers at the stop that day, and which of their shears could be on a ticket. */
  eligible(stopId: string, day: string): { customer: HistoryCustomer; shears: HistoryShear[] }[] {
    return (this.atStop.get(stopId) ?? [])
      .filter((span) => covers(span, day))
      .map(({ customer }) => ({
        customer,
        shears: (this.shearsOf.get(customer.id) ?? []).filter(
          (shear) =>
            (shear.registeredOn <= day || this.backdatable.has(shear.id)) &&
            (shear.statusOn === null || day < shear.statusOn),
        ),
      }))
      .filter((entry) => entry.shears.length > 0);
  }

  /** The visit's tickets, the first carrying the trip charge; none when nobody there had shears to do. */
  tickets(visit: PlannedVisit, stop: HistoryStop, chances: TicketChances): PlannedTicket[] {
    const chosen = visit.recorded ? this.recordedWork(visit) : [];
    const work = chosen.length > 0 ? chosen : this.drawnWork(visit, chances);
    return work.map((one, index) => this.priced(visit, stop, one, index === 0 && this.card.tripChargeCents > 0));
  }

  /** The shears the registry's history says were serviced at this visit, one ticket per owner. */
  private recordedWork(visit: PlannedVisit): Work[] {
    const byCustomer = new Map<string, Work>();
    for (const entry of this.servicedOn.get(visit.day) ?? []) {
      const shear = this.shearById.get(entry.shearId)!;
      const customer = this.customerById.get(shear.customerId)!;
      const stopThatDay = customer.spans.find((span) => covers(span, visit.day))?.stopId;
      if (stopThatDay !== visit.stopId) continue;
      const addOns = SUMMARY_ADD_ONS.filter(([words]) => entry.summary.includes(words)).map(([, code]) => code);
      const work = byCustomer.get(customer.id) ?? { customer, lines: [] };
      work.lines.push(this.draft(shear, [...new Set(addOns)], entry.id));
      byCustomer.set(customer.id, work);
    }
    return [...byCustomer.values()];
  }

  private drawnWork(visit: PlannedVisit, chances: TicketChances): Work[] {
    const there = this.eligible(visit.stopId, visit.day);
    const work = there.flatMap(({ customer, shears }): Work[] => {
      if (!this.rng.chance(chances.ticket)) return [];
      const picked = shears.filter(() => this.rng.chance(chances.line));
      const lines = (picked.length > 0 ? picked : [this.rng.pick(shears)]).map((shear) =>
        this.draft(shear, this.drawAddOns(shear), null),
      );
      return [{ customer, lines }];
    });
    // Someone always has a pair done when the sharpener calls.
    if (work.length === 0 && there.length > 0) {
      const { customer, shears } = this.rng.pick(there);
      const shear = this.rng.pick(shears);
      work.push({ customer, lines: [this.draft(shear, this.drawAddOns(shear), null)] });
    }
    return this.rng.shuffled(work);
  }

  private draft(shear: HistoryShear, addOns: AddOnCode[], servicedEntryId: string | null): DraftLine {
    return {
      id: randomUUID(),
      shear,
      addOns,
      servicedEntryId,
      override: this.rng.chance(OVERRIDE_CHANCE) ? this.rng.pick(OVERRIDES) : null,
    };
  }

  private drawAddOns(shear: HistoryShear): AddOnCode[] {
    return ADD_ON_CHANCES.filter((addOn) => addOn.applies(shear) && this.rng.chance(addOn.chance))
      .slice(0, 2)
      .map((addOn) => addOn.code);
  }

  /** Rules prices first; a price set by hand then replaces its line's, as applyOverrides does for the app. */
  private priced(visit: PlannedVisit, stop: HistoryStop, work: Work, chargeTrip: boolean): PlannedTicket {
    const rules = priceLines(
      work.lines.map((line) => ({ shear: line.shear, addOns: line.addOns, overrideCents: null, overrideReason: null })),
      this.card,
      { taxRateBp: stop.taxRateBp, chargeTrip },
    );
    const set = work.lines.map((line, i) => {
      const cents = line.override?.cents(rules.lines[i]!.priceCents) ?? null;
      // A price "set" to what the rules say is no override at all.
      const changed = cents !== null && cents !== rules.lines[i]!.priceCents;
      return {
        shear: line.shear,
        overrideCents: changed ? cents : null,
        overrideReason: changed ? line.override!.reason : null,
      };
    });
    const totals = applyOverrides(rules, set);
    return {
      id: randomUUID(),
      visit,
      stop,
      customer: work.customer,
      chargeTrip,
      lines: work.lines.map(({ override: _override, ...line }, i) => ({
        ...line,
        ...set[i]!,
        priceCents: rules.lines[i]!.priceCents,
        explanation: rules.lines[i]!.explanation,
      })),
      totals,
      settlement: this.settlement(stop, work.customer),
    };
  }

  private settlement(stop: HistoryStop, customer: HistoryCustomer): HistorySettlement {
    // A stop that pays as a whole is always invoiced: the stylist has nothing to pay at the chair.
    if (stop.billingMode === 'stop') return 'to-invoice';
    let prefers = this.prefersInvoice.get(customer.id);
    if (prefers === undefined) {
      prefers = this.rng.chance(PREFERS_INVOICE);
      this.prefersInvoice.set(customer.id, prefers);
    }
    return this.rng.chance(prefers ? 0.9 : 0.06) ? 'to-invoice' : 'paid-on-site';
  }
}

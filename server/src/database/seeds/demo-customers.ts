/** Builds the invented demo customers: 4 to 12 a stop (the schools more), a few who moved, and Jo Marlow's record. */
import { addDays } from '@keenroute/shared';
import type { Customer } from '../../customers/entities/customer.entity';
import type { CustomerStopHistory } from '../../customers/entities/customer-stop-history.entity';
import { DEMO_CUSTOMER_NOTES, DEMO_FIRST_NAMES, DEMO_LAST_NAMES } from './demo-names';
import type { DemoRandom } from './demo-random';
import type { DemoPeopleIds, StopPlan } from './demo-stops';
import { DEMO_EMAILS } from './demo-users';

export type CustomerRow = Omit<Customer, 'updatedAt'>;
export type HistoryRow = CustomerStopHistory;

export interface CustomerPlan {
  row: CustomerRow;
  stop: StopPlan;
  /** The day they started at their current stop. */
  since: string;
  /** Set for a customer who worked at an earlier stop first. */
  moved: { from: StopPlan; startedOn: string; movedOn: string } | null;
  leftHanded: boolean;
  history: HistoryRow[];
}

const AREA_CODES = ['218', '320', '507', '612', '651', '763'];
const MOVERS = 4;

const at = (date: string) => new Date(`${date}T15:00:00Z`);
const emailPart = (name: string) => name.toLowerCase().replace(/[^a-z]/g, '');

/** Unique invented names, phones and e-mails for one run. */
class PeopleFactory {
  private readonly names = new Set<string>(['Jo Marlow']);
  private readonly emails = new Set<string>([DEMO_EMAILS.client]);
  private readonly phones = new Set<string>();

  constructor(private readonly rng: DemoRandom) {}

  person(): { name: string; email: string | null; phone: string | null } {
    let first: string, last: string;
    do {
      first = this.rng.pick(DEMO_FIRST_NAMES);
      last = this.rng.pick(DEMO_LAST_NAMES);
    } while (this.names.has(`${first} ${last}`));
    this.names.add(`${first} ${last}`);
    return {
      name: `${first} ${last}`,
      email: this.rng.chance(0.88) ? this.email(first, last) : null,
      phone: this.rng.chance(0.85) ? this.phone() : null,
    };
  }

  private email(first: string, last: string): string {
    const styles = [`${emailPart(first)}.${emailPart(last)}`, `${emailPart(first)}${emailPart(last)[0]}`];
    let local = this.rng.pick(styles);
    for (let n = 2; this.emails.has(`${local}@demo.keenroute.test`); n++) local = `${styles[0]}${n}`;
    this.emails.add(`${local}@demo.keenroute.test`);
    return `${local}@demo.keenroute.test`;
  }

  private phone(): string {
    let phone: string;
    do phone = `(${this.rng.pick(AREA_CODES)}) 555-01${String(this.rng.int(0, 99)).padStart(2, '0')}`;
    while (this.phones.has(phone));
    this.phones.add(phone);
    return phone;
  }
}

function customerAt(
  rng: DemoRandom,
  stop: StopPlan,
  today: string,
  person: { name: string; email: string | null; phone: string | null },
  newId: () => string,
): CustomerPlan {
  const firstVisit = stop.visits[0]?.workedOn;
  const lastVisit = stop.visits[stop.visits.length - 1]?.workedOn;
  // Most were there before the first recorded visit; some joined later on.
  const since =
    firstVisit && lastVisit && rng.chance(0.85)
      ? addDays(firstVisit, -rng.int(0, 300))
      : addDays(lastVisit ?? today, -rng.int(7, 40));
  const contact = person.email !== null || person.phone !== null;
  return {
    row: {
      id: newId(),
      ...person,
      stopId: stop.row.id,
      userId: null,
      notes: rng.chance(0.1) ? rng.pick(DEMO_CUSTOMER_NOTES) : '',
      visitNoticeConsent: contact && rng.chance(0.88),
      active: rng.chance(0.98),
      createdAt: at(since),
    },
    stop,
    since,
    moved: null,
    leftHanded: rng.chance(0.075),
    history: [],
  };
}

/** Moves a customer: a closed stretch at an earlier stop of the same trade, then the current one from the move on. */
function makeMover(rng: DemoRandom, customer: CustomerPlan, from: StopPlan, today: string): void {
  const visitsBefore = from.visits.filter((visit) => visit.workedOn < addDays(today, -30));
  const lastThere = visitsBefore[visitsBefore.length - 1]?.workedOn ?? addDays(today, -60);
  const movedOn = addDays(lastThere, rng.int(5, 20));
  const startedOn = addDays(from.visits[0]?.workedOn ?? lastThere, -rng.int(30, 300));
  customer.moved = { from, startedOn, movedOn };
  customer.since = movedOn;
  customer.row.createdAt = at(startedOn);
}

function histories(customer: CustomerPlan, newId: () => string): HistoryRow[] {
  const current = { customerId: customer.row.id, stopId: customer.stop.row.id, endedAt: null };
  if (!customer.moved) return [{ id: newId(), ...current, startedAt: at(customer.since) }];
  const { from, startedOn, movedOn } = customer.moved;
  return [
    { id: newId(), customerId: customer.row.id, stopId: from.row.id, startedAt: at(startedOn), endedAt: at(movedOn) },
    { id: newId(), ...current, startedAt: at(movedOn) },
  ];
}

export function buildDemoCustomers(
  rng: DemoRandom,
  stops: readonly StopPlan[],
  today: string,
  people: DemoPeopleIds,
  newId: () => string,
): CustomerPlan[] {
  const factory = new PeopleFactory(rng);
  const customers = stops.flatMap((stop) =>
    Array.from({ length: rng.int(...stop.spec.customers) }, () =>
      customerAt(rng, stop, today, factory.person(), newId),
    ),
  );

  // Jo Marlow, the demo client (a groomer), works at the shop Rin Calloway manages.
  const managed = stops.find((stop) => stop.spec.role === 'managed')!;
  const jo = customerAt(
    rng,
    managed,
    today,
    { ...factory.person(), name: 'Jo Marlow', email: DEMO_EMAILS.client },
    newId,
  );
  Object.assign(jo.row, { userId: people.clientId, visitNoticeConsent: true, active: true, notes: '' });
  jo.leftHanded = true;
  customers.splice(
    customers.findIndex((customer) => customer.stop === managed),
    0,
    jo,
  );

  // A few stylists left the closed salon or changed shops; they keep their shears and their history.
  const movable = customers.filter((c) => c !== jo && c.stop.spec.role === undefined && c.stop.visits.length > 0);
  const inactive = stops.filter((stop) => stop.spec.role === 'inactive');
  for (const [i, customer] of rng.shuffled(movable).slice(0, MOVERS).entries()) {
    const sameTrade = stops.filter(
      (stop) => stop !== customer.stop && stop.spec.family === customer.stop.spec.family && stop.visits.length > 0,
    );
    const fromInactive = inactive.filter((stop) => stop.spec.family === customer.stop.spec.family);
    makeMover(rng, customer, i < 2 && fromInactive.length > 0 ? rng.pick(fromInactive) : rng.pick(sameTrade), today);
  }
  for (const customer of customers) customer.history = histories(customer, newId);
  return customers;
}

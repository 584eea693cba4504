/**
 * Builds the invented demo stops and their worked visits. Dates count from "today" so coming-due always looks current:
 * a few stops overdue by one to three weeks, several due this week and next, the rest later, one never visited.
 */
import {
  addDays,
  DEFAULT_CADENCE_WEEKS,
  type OpeningHours,
  type StopKind,
  weekdayOf,
  weekStart,
  WEEKDAYS,
  type Weekday,
} from '@keenroute/shared';
import type { Stop } from '../../stops/entities/stop.entity';
import type { StopVisit } from '../../stops/entities/stop-visit.entity';
import { DEMO_ADDRESSES } from './demo-city';
import type { DemoRandom } from './demo-random';
import {
  DEMO_ACCESS_BEST_TIME,
  DEMO_ACCESS_DOOR,
  DEMO_ACCESS_PARKING,
  DEMO_HOURS,
  DEMO_STOP_SPECS,
  type DemoStopSpec,
} from './demo-stop-data';

export interface DemoPeopleIds {
  ownerId: string;
  sharpenerId: string;
  clientId: string;
  shopManagerId: string;
}

export type StopRow = Omit<Stop, 'updatedAt'>;
export type VisitRow = Omit<StopVisit, 'createdAt'>;

export interface StopPlan {
  spec: DemoStopSpec;
  row: StopRow;
  /** Worked visits, oldest first. */
  visits: VisitRow[];
}

/** Invented sales tax for the demo's region, in basis points (6.88%); not any real jurisdiction's rate. */
export const DEMO_TAX_RATE_BP = 688;

type DueBucket = 'overdue' | 'this-week' | 'next-week' | 'later';
const BUCKETS: readonly (readonly [DueBucket, number])[] = [
  ['overdue', 4],
  ['this-week', 6],
  ['next-week', 7],
];

/** Cadences by kind of stop, in weeks (PRODUCT.md: salons every 6 to 10, grooming shops every 4 to 6). */
export const DEMO_CADENCES: Readonly<Record<StopKind, readonly number[]>> = {
  salon: [6, 7, 8, 8, 8, 9, 10],
  barbershop: [4, 5, 6, 6],
  'grooming-shop': [4, 5, 5, 6],
  school: [DEFAULT_CADENCE_WEEKS.school],
  clinic: [DEFAULT_CADENCE_WEEKS.clinic],
  other: [DEFAULT_CADENCE_WEEKS.other],
};

function slug(name: string): string {
  return name
    .toLowerCase()
    .replace(/&/g, 'and')
    .replace(/'/g, '')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '');
}

// Nobody books a sharpening visit on these public holidays (the visit history keeps off them too).
const HOLIDAYS = ['01-01', '07-04', '12-25'];
export const isDemoHoliday = (date: string) => HOLIDAYS.includes(date.slice(5));
const isOpen = (hours: OpeningHours, closed: readonly string[], date: string) =>
  (hours[weekdayOf(date)]?.length ?? 0) > 0 && !closed.includes(date) && !isDemoHoliday(date);

/** The latest open day on or before the date (a visit is worked when the stop is open). */
function openOnOrBefore(hours: OpeningHours, closed: readonly string[], date: string): string {
  let day = date;
  while (!isOpen(hours, closed, day)) day = addDays(day, -1);
  return day;
}

/** A due date in [from, to] on an open weekday; cadences are whole weeks, so the last visit shares that weekday. */
function dueIn(rng: DemoRandom, hours: OpeningHours, from: string, to: string): string {
  const candidates: string[] = [];
  for (let day = from; day <= to; day = addDays(day, 1)) if (isOpen(hours, [], day)) candidates.push(day);
  return rng.pick(candidates);
}

function dueRange(bucket: DueBucket, today: string, cadenceWeeks: number): [string, string] {
  const monday = weekStart(today);
  switch (bucket) {
    case 'overdue':
      return [addDays(today, -21), addDays(today, -7)];
    case 'this-week':
      return [monday, addDays(monday, 6)];
    case 'next-week':
      return [addDays(monday, 7), addDays(monday, 13)];
    case 'later':
      return [addDays(monday, 14), addDays(today, cadenceWeeks * 7 - 2)];
  }
}

function closedDates(rng: DemoRandom, today: string): string[] {
  if (!rng.chance(0.25)) return [];
  const dates = new Set<string>();
  const count = rng.int(1, 3);
  for (let i = 0; i < count; i++) dates.add(addDays(today, rng.int(3, 75)));
  return [...dates].sort();
}

function preferredWeekdays(rng: DemoRandom, hours: OpeningHours): Weekday[] {
  if (!rng.chance(0.4)) return [];
  const openDays = WEEKDAYS.filter((day) => (hours[day]?.length ?? 0) > 0);
  const chosen = rng.shuffled(openDays).slice(0, rng.int(1, 2));
  return WEEKDAYS.filter((day) => chosen.includes(day));
}

function billingMode(rng: DemoRandom, spec: DemoStopSpec): Stop['billingMode'] {
  if (spec.kind === 'school' || spec.kind === 'clinic' || spec.kind === 'other') return 'stop';
  return spec.kind === 'grooming-shop' && rng.chance(0.3) ? 'stop' : 'customer';
}

function visitsFor(
  rng: DemoRandom,
  row: StopRow,
  lastVisitOn: string,
  people: DemoPeopleIds,
  newId: () => string,
): VisitRow[] {
  const dates = [lastVisitOn];
  const count = rng.int(2, 5);
  while (dates.length < count) {
    const previous = addDays(dates[dates.length - 1]!, -row.cadenceWeeks * 7 + rng.int(-4, 4));
    dates.push(openOnOrBefore(row.openingHours, [], previous));
  }
  const other = row.assignedSharpenerId === people.sharpenerId ? people.ownerId : people.sharpenerId;
  return dates.reverse().map((workedOn) => ({
    id: newId(),
    stopId: row.id,
    workedOn,
    sharpenerId: rng.chance(0.85) ? row.assignedSharpenerId : other,
  }));
}

export function buildDemoStops(rng: DemoRandom, today: string, people: DemoPeopleIds, newId: () => string): StopPlan[] {
  // Spread the due buckets over the visited, active stops at random; the rest fall due later.
  const visited = DEMO_STOP_SPECS.flatMap((spec, index) =>
    spec.role === 'never-visited' || spec.role === 'inactive' ? [] : [index],
  );
  const order = rng.shuffled(visited);
  const bucketOf = new Map<number, DueBucket>();
  for (const [bucket, count] of BUCKETS) for (let i = 0; i < count; i++) bucketOf.set(order.shift()!, bucket);

  return DEMO_STOP_SPECS.map((spec, index): StopPlan => {
    const address = DEMO_ADDRESSES[index]!;
    const hours = rng.weighted(DEMO_HOURS[spec.kind]);
    const withNotes = rng.chance(0.75);
    const row: StopRow = {
      id: newId(),
      name: spec.name,
      kind: spec.kind,
      ...address,
      geocodeStatus: 'found',
      phone: `(507) 555-01${String(index).padStart(2, '0')}`,
      email: rng.chance(0.9)
        ? `${rng.pick(['hello', 'frontdesk', 'bookings'])}@${slug(spec.name)}.demo.keenroute.test`
        : null,
      openingHours: hours,
      closedDates: closedDates(rng, today),
      cadenceWeeks: rng.pick(DEMO_CADENCES[spec.kind]),
      preferredWeekdays: preferredWeekdays(rng, hours),
      billingMode: billingMode(rng, spec),
      taxRateBp: spec.kind === 'school' || rng.chance(0.15) ? 0 : DEMO_TAX_RATE_BP,
      accessParking: withNotes ? rng.pick(DEMO_ACCESS_PARKING) : '',
      accessDoor: withNotes && rng.chance(0.8) ? rng.pick(DEMO_ACCESS_DOOR[spec.family]) : '',
      accessBestTime: withNotes && rng.chance(0.8) ? rng.pick(DEMO_ACCESS_BEST_TIME[spec.family]) : '',
      assignedSharpenerId: rng.chance(0.75) ? people.sharpenerId : people.ownerId,
      managerUserId: spec.role === 'managed' ? people.shopManagerId : null,
      active: spec.role !== 'inactive',
      createdAt: new Date(0),
    };
    let visits: VisitRow[] = [];
    if (spec.role === 'inactive') {
      visits = visitsFor(rng, row, openOnOrBefore(hours, [], addDays(today, -rng.int(90, 150))), people, newId);
    } else if (spec.role !== 'never-visited') {
      const [from, to] = dueRange(bucketOf.get(index) ?? 'later', today, row.cadenceWeeks);
      const lastVisitOn = addDays(dueIn(rng, hours, from, to), -row.cadenceWeeks * 7);
      visits = visitsFor(rng, row, lastVisitOn, people, newId);
    }
    // The stop was entered a little before its first visit (the never-visited one: last week).
    const firstDay = visits[0]?.workedOn ?? today;
    row.createdAt = new Date(`${addDays(firstDay, -rng.int(3, 30))}T15:00:00Z`);
    return { spec, row, visits };
  });
}

/**
 * The report benchmark's registry: invented stops in twelve invented towns around Larkhaven, their customers, the
 * customers' shears in the demo's mix, and sixteen sharpeners who each drive their own part of the map. Everything is made up, as
 * the demo is; the visit history is then added by the generator the demo seed uses (src/database/seeds/history).
 */
import { addDays, formatTagCode, type StopKind, type ToolKind } from '@keenroute/shared';
import { hash } from 'bcryptjs';
import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { BCRYPT_COST } from '../../../src/auth/jwt.constants';
import { Customer } from '../../../src/customers/entities/customer.entity';
import { CustomerStopHistory } from '../../../src/customers/entities/customer-stop-history.entity';
import { DEMO_CENTRE, DEMO_COUNTRY, DEMO_REGION } from '../../../src/database/seeds/demo-city';
import {
  DEMO_FIRST_NAMES,
  DEMO_GROOMING_MAKES,
  DEMO_HAIR_MAKES,
  DEMO_LAST_NAMES,
} from '../../../src/database/seeds/demo-names';
import { DemoRandom } from '../../../src/database/seeds/demo-random';
import { DEMO_SHEAR_MIX } from '../../../src/database/seeds/demo-shears';
import { DEMO_HOURS, DEMO_STOP_SPECS } from '../../../src/database/seeds/demo-stop-data';
import { DEMO_CADENCES, DEMO_TAX_RATE_BP } from '../../../src/database/seeds/demo-stops';
import { DEMO_EMAILS, DEMO_PASSWORD } from '../../../src/database/seeds/demo-users';
import { insertRows } from '../../../src/database/seeds/history/insert-rows';
import { Shear } from '../../../src/shears/entities/shear.entity';
import { ShearHistoryEntry } from '../../../src/shears/entities/shear-history-entry.entity';
import { Stop } from '../../../src/stops/entities/stop.entity';
import { User } from '../../../src/users/entities/user.entity';

export interface BenchRegistrySize {
  stops: number;
  customersPerStop: number;
  /** Sharpeners besides the demo sharpener and the owner. */
  extraSharpeners: number;
}

export interface BenchRegistryCounts {
  stops: number;
  customers: number;
  shears: number;
  sharpeners: number;
}

/** Invented towns, each a cluster of stops; offsets in degrees from Larkhaven's centre. */
const TOWNS: readonly { name: string; lat: number; lon: number; postalCode: string }[] = [
  { name: 'Larkhaven', lat: 0, lon: 0, postalCode: '55901' },
  { name: 'Copperford', lat: 0.11, lon: 0.16, postalCode: '55910' },
  { name: 'Wrenfield', lat: -0.12, lon: 0.2, postalCode: '55911' },
  { name: 'Halden Cross', lat: 0.2, lon: -0.1, postalCode: '55912' },
  { name: 'Ashby Mere', lat: -0.18, lon: -0.22, postalCode: '55913' },
  { name: 'Kestrel Bay', lat: 0.3, lon: 0.28, postalCode: '55914' },
  { name: 'Thornwick', lat: -0.3, lon: 0.05, postalCode: '55915' },
  { name: 'Millrace', lat: 0.05, lon: -0.35, postalCode: '55916' },
  { name: 'Brindle Hollow', lat: 0.36, lon: -0.3, postalCode: '55917' },
  { name: 'Saltmarsh', lat: -0.38, lon: 0.4, postalCode: '55918' },
  { name: 'Fenmoor', lat: 0.16, lon: 0.45, postalCode: '55919' },
  { name: 'Oakhurst', lat: -0.08, lon: -0.5, postalCode: '55920' },
];
const STREETS = ['Market Street', 'Mill Lane', 'Station Road', 'Church Row', 'High Street', 'Orchard Way', 'Quay Road'];

const family = (kind: StopKind): 'hair' | 'grooming' => (kind === 'grooming-shop' ? 'grooming' : 'hair');
const at = (day: string) => new Date(`${day}T15:00:00Z`);
const round6 = (value: number) => Math.round(value * 1e6) / 1e6;

async function benchSharpeners(manager: EntityManager, extra: number): Promise<string[]> {
  const passwordHash = await hash(DEMO_PASSWORD, BCRYPT_COST);
  const users = manager.getRepository(User);
  const rows = Array.from({ length: extra }, (_, i) => ({
    email: `bench-sharpener-${i + 1}@bench.keenroute.test`,
    name: `Bench Sharpener ${i + 1} (invented)`,
    role: 'sharpener' as const,
    passwordHash,
    active: true,
  }));
  await users.insert(rows);
  const people = await users.find({
    where: [DEMO_EMAILS.sharpener, DEMO_EMAILS.owner, ...rows.map((row) => row.email)].map((email) => ({ email })),
    order: { email: 'ASC' },
  });
  return people.map((user) => user.id);
}

export async function seedBenchRegistry(
  manager: EntityManager,
  options: { today: string; years: number; seed: number; size: BenchRegistrySize },
): Promise<BenchRegistryCounts> {
  const rng = new DemoRandom(options.seed);
  const { size, today } = options;
  const start = addDays(today, -Math.round(options.years * 365));
  const sharpeners = await benchSharpeners(manager, size.extraSharpeners);

  const stops = Array.from({ length: size.stops }, (_, i) => {
    const spec = DEMO_STOP_SPECS[i % DEMO_STOP_SPECS.length]!;
    const townIndex = Math.floor(i / DEMO_STOP_SPECS.length) % TOWNS.length;
    const town = TOWNS[townIndex]!;
    const round = Math.floor(i / (DEMO_STOP_SPECS.length * TOWNS.length));
    const stop: Omit<Stop, 'updatedAt'> = {
      id: randomUUID(),
      name: `${spec.name}, ${town.name}${round > 0 ? ` ${round + 1}` : ''} (bench)`,
      kind: spec.kind,
      street: `${rng.int(1, 400)} ${rng.pick(STREETS)}`,
      city: town.name,
      region: DEMO_REGION,
      postalCode: town.postalCode,
      country: DEMO_COUNTRY,
      latitude: round6(DEMO_CENTRE.latitude + town.lat + (rng.float() - 0.5) * 0.05),
      longitude: round6(DEMO_CENTRE.longitude + town.lon + (rng.float() - 0.5) * 0.07),
      geocodeStatus: 'found',
      phone: null,
      email: rng.chance(0.85) ? `stop-${i + 1}@bench.keenroute.test` : null,
      openingHours: rng.weighted(DEMO_HOURS[spec.kind]),
      closedDates: [],
      cadenceWeeks: rng.pick(DEMO_CADENCES[spec.kind]),
      preferredWeekdays: [],
      billingMode:
        spec.kind === 'school' || spec.kind === 'clinic' || (spec.kind === 'grooming-shop' && rng.chance(0.3))
          ? 'stop'
          : 'customer',
      taxRateBp: spec.kind === 'school' || rng.chance(0.15) ? 0 : DEMO_TAX_RATE_BP,
      accessParking: '',
      accessDoor: '',
      accessBestTime: '',
      // Stops come town by town, so each sharpener's share is one town or two neighbouring ones.
      assignedSharpenerId: sharpeners[Math.floor((i * sharpeners.length) / size.stops)]!,
      managerUserId: null,
      active: true,
      createdAt: at(addDays(start, -rng.int(60, 400))),
    };
    return stop;
  });

  const names = rng.shuffled(DEMO_FIRST_NAMES.flatMap((first) => DEMO_LAST_NAMES.map((last) => `${first} ${last}`)));
  const customers: Omit<Customer, 'updatedAt'>[] = [];
  const spans: CustomerStopHistory[] = [];
  const shears: Omit<Shear, 'updatedAt' | 'tagCode'>[] = [];
  const history: Omit<ShearHistoryEntry, 'createdAt'>[] = [];
  for (const stop of stops) {
    for (let n = 0; n < size.customersPerStop; n++) {
      const index = customers.length;
      const name = `${names[index % names.length]!}${index >= names.length ? ` ${Math.floor(index / names.length) + 1}` : ''}`;
      // Most were there before the history starts; some joined during it.
      const since = rng.chance(0.8)
        ? addDays(start, -rng.int(0, 400))
        : addDays(start, rng.int(0, options.years * 330));
      const customer = {
        id: randomUUID(),
        name,
        email: rng.chance(0.85) ? `customer-${index + 1}@bench.keenroute.test` : null,
        phone: null,
        stopId: stop.id,
        userId: null,
        notes: '',
        visitNoticeConsent: false,
        active: true,
        createdAt: at(since),
      };
      customers.push(customer);
      spans.push({ id: randomUUID(), customerId: customer.id, stopId: stop.id, startedAt: at(since), endedAt: null });
      const use = family(stop.kind);
      const count = rng.weighted(DEMO_SHEAR_MIX.count);
      for (let k = 0; k < count; k++) {
        const toolKind: ToolKind = k === 0 ? 'straight' : rng.weighted(DEMO_SHEAR_MIX.toolKinds[use]);
        const line = rng.pick(use === 'hair' ? DEMO_HAIR_MAKES : DEMO_GROOMING_MAKES);
        const registeredOn = k === 0 || rng.chance(0.7) ? since : addDays(since, rng.int(30, 600));
        if (registeredOn >= today) continue;
        const retired = rng.chance(0.03);
        const shear = {
          id: randomUUID(),
          customerId: customer.id,
          make: line.make,
          model: rng.pick(line.models),
          lengthIn: rng.weighted(DEMO_SHEAR_MIX.lengths[use][toolKind]),
          edgeType: rng.weighted(DEMO_SHEAR_MIX.edgeTypes[use]),
          toolKind,
          handedness: rng.chance(0.08) ? ('left' as const) : ('right' as const),
          use,
          notes: '',
          status: retired ? ('retired' as const) : ('in-service' as const),
          createdAt: at(registeredOn),
        };
        shears.push(shear);
        history.push({
          id: randomUUID(),
          shearId: shear.id,
          happenedOn: registeredOn,
          kind: 'registered',
          summary: `Registered at ${stop.name}.`,
          ticketId: null,
          recordedBy: stop.assignedSharpenerId,
        });
        if (retired) {
          const retiredOn = addDays(registeredOn, rng.int(60, 900));
          history.push({
            id: randomUUID(),
            shearId: shear.id,
            happenedOn: retiredOn < today ? retiredOn : addDays(today, -1),
            kind: 'status',
            summary: 'Retired: worn too narrow to sharpen again.',
            ticketId: null,
            recordedBy: null,
          });
        }
      }
    }
  }
  shears.sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime());
  const serials = await manager.query<{ serial: string }[]>(
    `SELECT nextval('shear_tag_serial') AS serial FROM generate_series(1, $1) ORDER BY 1`,
    [shears.length],
  );
  await insertRows(manager, Stop, stops);
  await insertRows(manager, Customer, customers);
  await insertRows(manager, CustomerStopHistory, spans);
  await insertRows(
    manager,
    Shear,
    shears.map((shear, i) => ({ ...shear, tagCode: formatTagCode(Number(serials[i]!.serial)) })),
  );
  await insertRows(manager, ShearHistoryEntry, history);
  return { stops: stops.length, customers: customers.length, shears: shears.length, sharpeners: sharpeners.length };
}

/**
 * The demo seed: invented users, a demo rate card, planning settings, the business profile on the invoices, an
 * invented registry for the demo scenario (Larkhaven) and two years of invented past work at its stops.
 */
import { DEMO_RATE_CARD } from '@keenroute/shared';
import { hash } from 'bcryptjs';
import { type DataSource, type EntityManager, In } from 'typeorm';
import { BCRYPT_COST } from '../../auth/jwt.constants';
import { RateCardVersion } from '../../rates/entities/rate-card-version.entity';
import { User } from '../../users/entities/user.entity';
import { seedDemoBusinessProfile } from './demo-business';
import { DEMO_ADDRESSES } from './demo-city';
import { seedDemoPlanning } from './demo-planning';
import { DEMO_SEED } from './demo-registry';
import { DEMO_STOP_SPECS } from './demo-stop-data';
import { DEMO_PASSWORD, DEMO_USERS } from './demo-users';
import { DEMO_HISTORY_SCALE } from './history/history-options';
import { historyIsMissing, seedHistory } from './history/seed-history';
import { registryIsEmpty, seedDemoRegistry } from './seed-registry';

/** Any fixed number: two seeds started at once wait for each other instead of both inserting. */
const SEED_LOCK = 73_112_025;

/** The app's default BUSINESS_TIME_ZONE (config/environment.ts), for callers that do not pass theirs. */
const DEFAULT_TIME_ZONE = 'America/Chicago';

export interface SeedDemoOptions {
  /** The day the demo counts from ("YYYY-MM-DD"); the UTC date by default, so visits always look recent. */
  today?: string;
  /** The business time zone the history's times of day are in. */
  timeZone?: string;
}

/** The demo users (by e-mail), a rate card (when there is none), the planning settings and the business profile. */
export async function seedDemoBasics(manager: EntityManager): Promise<boolean> {
  let changed = false;
  const users = manager.getRepository(User);
  const present = await users.find({ where: { email: In(DEMO_USERS.map((user) => user.email)) } });
  const missing = DEMO_USERS.filter((user) => !present.some((existing) => existing.email === user.email));
  if (missing.length > 0) {
    const passwordHash = await hash(DEMO_PASSWORD, BCRYPT_COST);
    await users.insert(missing.map((user) => ({ ...user, passwordHash, active: true })));
    changed = true;
  }
  if ((await manager.getRepository(RateCardVersion).count()) === 0) {
    await manager.getRepository(RateCardVersion).insert({ card: DEMO_RATE_CARD, createdBy: null });
    changed = true;
  }
  if (await seedDemoPlanning(manager)) changed = true;
  if (await seedDemoBusinessProfile(manager)) changed = true;
  return changed;
}

/** The demo's own stops (by name and address): only they get an invented past, never a stop someone entered. */
async function demoStopIds(manager: EntityManager): Promise<string[]> {
  const rows = await manager.query<{ id: string }[]>(`SELECT id FROM stops WHERE name = ANY($1) AND street = ANY($2)`, [
    DEMO_STOP_SPECS.map((spec) => spec.name),
    DEMO_ADDRESSES.map((address) => address.street),
  ]);
  return rows.map((row) => row.id);
}

/**
 * Seeds the invented demo scenario; each part only where it is missing: the basics above, the registry (when there
 * are no stops and no customers) and the visit history (when no ticket is older than two weeks). Returns false when
 * nothing was added.
 */
export async function seedDemo(dataSource: DataSource, options: SeedDemoOptions = {}): Promise<boolean> {
  const today = options.today ?? new Date().toISOString().slice(0, 10);
  return dataSource.transaction(async (manager) => {
    await manager.query('SELECT pg_advisory_xact_lock($1)', [SEED_LOCK]);
    let changed = await seedDemoBasics(manager);
    if (await registryIsEmpty(manager)) {
      await seedDemoRegistry(manager, today);
      changed = true;
    }
    if (await historyIsMissing(manager, today)) {
      const stopIds = await demoStopIds(manager);
      if (stopIds.length > 0) {
        const history = await seedHistory(manager, {
          today,
          timeZone: options.timeZone ?? DEFAULT_TIME_ZONE,
          seed: DEMO_SEED + 1,
          stopIds,
          scale: DEMO_HISTORY_SCALE,
        });
        if (history.tickets > 0) changed = true;
      }
    }
    return changed;
  });
}

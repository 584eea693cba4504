/**
 * The demo seed: invented users, a demo rate card, planning settings, the business profile on the invoices and an
 * invented registry for the demo scenario (Larkhaven).
 */
import { DEMO_RATE_CARD } from '@keenroute/shared';
import { hash } from 'bcryptjs';
import { type DataSource, In } from 'typeorm';
import { BCRYPT_COST } from '../../auth/jwt.constants';
import { RateCardVersion } from '../../rates/entities/rate-card-version.entity';
import { User } from '../../users/entities/user.entity';
import { seedDemoBusinessProfile } from './demo-business';
import { seedDemoPlanning } from './demo-planning';
import { DEMO_PASSWORD, DEMO_USERS } from './demo-users';
import { registryIsEmpty, seedDemoRegistry } from './seed-registry';

/** Any fixed number: two seeds started at once wait for each other instead of both inserting. */
const SEED_LOCK = 73_112_025;

export interface SeedDemoOptions {
  /** The day the demo counts from ("YYYY-MM-DD"); the UTC date by default, so visits always look recent. */
  today?: string;
}

/**
 * Seeds the invented demo scenario; each part only where it is missing: the demo users (by e-mail), a rate card (when
 * there is none) and the registry (when there are no stops and no customers). Returns false when nothing was added.
 */
export async function seedDemo(dataSource: DataSource, options: SeedDemoOptions = {}): Promise<boolean> {
  const today = options.today ?? new Date().toISOString().slice(0, 10);
  return dataSource.transaction(async (manager) => {
    await manager.query('SELECT pg_advisory_xact_lock($1)', [SEED_LOCK]);
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
    if (await registryIsEmpty(manager)) {
      await seedDemoRegistry(manager, today);
      changed = true;
    }
    return changed;
  });
}

import { DEMO_RATE_CARD } from '@keenroute/shared';
import { hash } from 'bcryptjs';
import type { DataSource } from 'typeorm';
import { BCRYPT_COST } from '../../auth/jwt.constants';
import { RateCardVersion } from '../../rates/entities/rate-card-version.entity';
import { User } from '../../users/entities/user.entity';
import { DEMO_PASSWORD, DEMO_USERS } from './demo-users';

/** Seeds the invented demo scenario once; returns false (and changes nothing) when it is already there. */
export async function seedDemo(dataSource: DataSource): Promise<boolean> {
  const users = dataSource.getRepository(User);
  if (await users.exists({ where: { email: DEMO_USERS[0]!.email } })) return false;
  const passwordHash = await hash(DEMO_PASSWORD, BCRYPT_COST);
  await dataSource.transaction(async (manager) => {
    await manager.getRepository(User).insert(DEMO_USERS.map((user) => ({ ...user, passwordHash, active: true })));
    if ((await manager.getRepository(RateCardVersion).count()) === 0) {
      await manager.getRepository(RateCardVersion).insert({ card: DEMO_RATE_CARD, createdBy: null });
    }
  });
  return true;
}

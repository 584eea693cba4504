import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { validateEnvironment } from '../../config/environment';
import { typeormOptions } from '../typeorm-options';
import { seedDemo } from './seed-demo';

/** `npm run seed -w server`: loads the demo scenario into an empty database, and leaves a seeded one alone. */
async function main(): Promise<void> {
  const environment = validateEnvironment(process.env);
  const dataSource = await new DataSource(typeormOptions(environment.DATABASE_URL)).initialize();
  try {
    const seeded = await seedDemo(dataSource, { timeZone: environment.BUSINESS_TIME_ZONE });
    console.log(seeded ? 'Demo data loaded (invented people and places).' : 'Demo data already present; kept as is.');
  } finally {
    await dataSource.destroy();
  }
}

main().catch((error: unknown) => {
  console.error('Seeding failed:', error instanceof Error ? error.message : error);
  process.exitCode = 1;
});

import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { typeormOptions } from '../src/database/typeorm-options';

/** Brings the test database up to the latest migration once, before any e2e file runs. */
export default async function globalSetup(): Promise<void> {
  const missing = ['DATABASE_URL', 'SMTP_PORT', 'MAIL_CATCHER_URL'].filter((name) => !process.env[name]);
  if (missing.length > 0) {
    throw new Error(
      `The e2e tests need ${missing.join(', ')}: run them through \`npm test\`, which starts PostgreSQL and the mail catcher.`,
    );
  }
  const dataSource = await new DataSource(typeormOptions(process.env.DATABASE_URL!)).initialize();
  try {
    await dataSource.runMigrations({ transaction: 'each' });
  } finally {
    await dataSource.destroy();
  }
}

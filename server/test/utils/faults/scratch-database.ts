import { randomBytes } from 'node:crypto';
import { DataSource } from 'typeorm';
import { typeormOptions } from '../../../src/database/typeorm-options';

export interface ScratchDatabase {
  url: string;
  db: DataSource;
  drop(): Promise<void>;
}

/** The same server and credentials as `base`, another database. */
export function databaseUrl(base: string, name: string): string {
  const url = new URL(base);
  url.pathname = `/${name}`;
  return url.toString();
}

/**
 * A fresh, migrated database on the e2e run's PostgreSQL, for one fault test: its 'mail.send' queue is its own, so the
 * other test files' servers (which work the shared database's queues) never take its jobs, nor it theirs.
 */
export async function createScratchDatabase(prefix: string): Promise<ScratchDatabase> {
  const base = process.env.DATABASE_URL!;
  const name = `${prefix}_${randomBytes(4).toString('hex')}`;
  const admin = await new DataSource({ type: 'postgres', url: databaseUrl(base, 'postgres') }).initialize();
  try {
    await admin.query(`CREATE DATABASE "${name}"`);
  } finally {
    await admin.destroy();
  }
  const url = databaseUrl(base, name);
  const db = await new DataSource(typeormOptions(url)).initialize();
  await db.runMigrations({ transaction: 'each' });
  return {
    url,
    db,
    async drop() {
      await db.destroy();
      const cleanup = await new DataSource({ type: 'postgres', url: databaseUrl(base, 'postgres') }).initialize();
      try {
        await cleanup.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
      } finally {
        await cleanup.destroy();
      }
    },
  };
}

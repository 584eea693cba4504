import type { DataSource } from 'typeorm';

/**
 * One cluster-wide advisory lock around pg-boss's schema and queue set-up. pg-boss 10 creates a queue with DML and DDL
 * in one statement (a row in pgboss.queue, then a partition with foreign keys back to it), and two processes doing
 * that at once can deadlock; app instances and parallel e2e workers start together, so they take turns here.
 */
const SETUP_LOCK = 'keenroute:jobs-setup';

export async function withJobsSetupLock<T>(dataSource: DataSource, work: () => Promise<T>): Promise<T> {
  const runner = dataSource.createQueryRunner();
  await runner.connect();
  try {
    // A session lock on this one connection: held across pg-boss's own statements on its own pool.
    await runner.query('SELECT pg_advisory_lock(hashtext($1))', [SETUP_LOCK]);
    try {
      return await work();
    } finally {
      await runner.query('SELECT pg_advisory_unlock(hashtext($1))', [SETUP_LOCK]);
    }
  } finally {
    await runner.release();
  }
}

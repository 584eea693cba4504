import PgBoss from 'pg-boss';
import type { DataSource } from 'typeorm';

export interface JobRow {
  id: string;
  state: string;
  retryCount: number;
}

/**
 * Puts jobs on an app queue from outside every instance, the way a scheduled run or another replica would: a pg-boss
 * client of its own on the same 'pgboss' schema that only sends (no maintenance, no schedules, no workers).
 */
export async function sendJobs(databaseUrl: string, queue: string, jobs: readonly object[]): Promise<string[]> {
  const boss = new PgBoss({
    connectionString: databaseUrl,
    schema: 'pgboss',
    application_name: 'keenroute-e2e-sender',
    max: 1,
    migrate: false,
    supervise: false,
    schedule: false,
  });
  await boss.start();
  try {
    const ids: string[] = [];
    for (const data of jobs) {
      const id = await boss.send(queue, data);
      if (!id) throw new Error(`pg-boss took no job on ${queue}`);
      ids.push(id);
    }
    return ids;
  } finally {
    await boss.stop({ graceful: false, wait: true });
  }
}

/** The jobs' state as pg-boss keeps it: a job that ran once and succeeded is 'completed' with no retry. */
export async function jobRows(db: DataSource, ids: readonly string[]): Promise<JobRow[]> {
  return db.query<JobRow[]>(
    `SELECT id, state, retry_count AS "retryCount" FROM pgboss.job WHERE id = ANY($1::uuid[]) ORDER BY id`,
    [ids],
  );
}

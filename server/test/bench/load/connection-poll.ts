import type { DataSource } from 'typeorm';

/**
 * Counts the database's connections once a second while the load runs: the app's pool, the job queue's and anyone
 * else's on this database, leaving out the poll's own connection.
 */
export class ConnectionPoll {
  private readonly counts: number[] = [];
  private timer: NodeJS.Timeout | undefined;
  private failure: Error | undefined;

  constructor(private readonly db: DataSource) {}

  start(): void {
    const sample = async () => {
      const [row] = await this.db.query<{ n: number }[]>(
        'SELECT count(*)::int AS n FROM pg_stat_activity WHERE datname = current_database() AND pid <> pg_backend_pid()',
      );
      this.counts.push(row!.n);
    };
    this.timer = setInterval(() => {
      sample().catch((error: Error) => (this.failure ??= error));
    }, 1000);
  }

  stop(): { max: number; mean: number; samples: number } {
    clearInterval(this.timer);
    if (this.failure) throw new Error(`Counting the database's connections failed: ${this.failure.message}`);
    const max = this.counts.reduce((a, b) => Math.max(a, b), 0);
    const mean = this.counts.length > 0 ? this.counts.reduce((a, b) => a + b, 0) / this.counts.length : 0;
    return { max, mean, samples: this.counts.length };
  }
}

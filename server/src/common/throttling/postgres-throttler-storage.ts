import type { ThrottlerStorage } from '@nestjs/throttler';
import type { DataSource } from 'typeorm';

type ThrottlerStorageRecord = Awaited<ReturnType<ThrottlerStorage['increment']>>;

/** How often one instance clears counters whose window and block have long passed. */
const SWEEP_EVERY_MS = 10 * 60_000;

/**
 * The rate limits' counters in PostgreSQL, so every API instance behind a load balancer counts the same attempts
 * (the throttler's own store is per process: two instances would allow twice the limit). A fixed window per key:
 * the first hit opens a window of `ttl`; the hit past `limit` blocks the key for `blockDuration`. One upsert per
 * hit, on an unlogged table: counters need no crash safety, and a restart of PostgreSQL only forgives them.
 */
export class PostgresThrottlerStorage implements ThrottlerStorage {
  private lastSweep = 0;

  constructor(private readonly dataSource: DataSource) {}

  async increment(key: string, ttl: number, limit: number, blockDuration: number): Promise<ThrottlerStorageRecord> {
    this.sweepNowAndThen();
    const [row] = await this.dataSource.query<
      { hits: number; expire_s: number; blocked: boolean; block_s: number | null }[]
    >(
      `INSERT INTO rate_limit_hits AS r (key, hits, window_ends_at, blocked_until)
       VALUES ($1, 1, now() + $2 * interval '1 millisecond',
               CASE WHEN 1 > $3 THEN now() + $4 * interval '1 millisecond' END)
       ON CONFLICT (key) DO UPDATE SET
         hits = CASE WHEN r.window_ends_at <= now() AND COALESCE(r.blocked_until <= now(), true) THEN 1
                     ELSE LEAST(r.hits + 1, $3 + 1) END,
         window_ends_at = CASE WHEN r.window_ends_at <= now() AND COALESCE(r.blocked_until <= now(), true)
                               THEN now() + $2 * interval '1 millisecond' ELSE r.window_ends_at END,
         blocked_until = CASE WHEN r.window_ends_at <= now() AND COALESCE(r.blocked_until <= now(), true)
                                   THEN CASE WHEN 1 > $3 THEN now() + $4 * interval '1 millisecond' END
                              WHEN r.blocked_until > now() THEN r.blocked_until
                              WHEN r.hits + 1 > $3 THEN now() + $4 * interval '1 millisecond' END
       RETURNING hits,
                 ceil(extract(epoch FROM window_ends_at - now()))::int AS expire_s,
                 COALESCE(blocked_until > now(), false) AS blocked,
                 ceil(extract(epoch FROM blocked_until - now()))::int AS block_s`,
      [key, ttl, limit, blockDuration],
    );
    return {
      totalHits: row!.hits,
      timeToExpire: Math.max(0, row!.expire_s),
      isBlocked: row!.blocked,
      timeToBlockExpire: row!.blocked ? Math.max(0, row!.block_s ?? 0) : 0,
    };
  }

  /** Fire and forget: a failed sweep only leaves old rows for the next one. */
  private sweepNowAndThen(): void {
    if (Date.now() - this.lastSweep < SWEEP_EVERY_MS) return;
    this.lastSweep = Date.now();
    void this.dataSource
      .query(
        `DELETE FROM rate_limit_hits
          WHERE window_ends_at < now() - interval '1 hour' AND COALESCE(blocked_until < now(), true)`,
      )
      .catch(() => undefined);
  }
}

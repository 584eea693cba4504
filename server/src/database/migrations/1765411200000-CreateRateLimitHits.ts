import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The rate limits' counters, shared by every API instance (common/throttling). Unlogged: not written to the WAL, so a
 * hit costs little and a crash of PostgreSQL empties the table, which only forgives the counters of the last minute.
 */
export class CreateRateLimitHits1765411200000 implements MigrationInterface {
  name = 'CreateRateLimitHits1765411200000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE UNLOGGED TABLE rate_limit_hits (
        key text PRIMARY KEY,
        hits integer NOT NULL CHECK (hits > 0),
        window_ends_at timestamptz NOT NULL,
        blocked_until timestamptz
      )`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE rate_limit_hits`);
  }
}

import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Keeps each ticket's number of shears (its lines) on the ticket, written with its totals whenever the lines change,
 * and carries it in the worked-tickets index. Counting the lines per ticket in the revenue reports was the largest
 * part of their time on three years of work (one index probe per ticket); docs/benchmarks.md has the figures.
 */
export class AddTicketShearCount1765324800000 implements MigrationInterface {
  name = 'AddTicketShearCount1765324800000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE tickets ADD COLUMN shear_count integer NOT NULL DEFAULT 0 CHECK (shear_count >= 0)`,
    );
    await queryRunner.query(`
      UPDATE tickets t SET shear_count = l.shears
        FROM (SELECT ticket_id, count(*)::int AS shears FROM ticket_lines GROUP BY ticket_id) l
       WHERE l.ticket_id = t.id`);
    await queryRunner.query(`DROP INDEX tickets_worked_day_idx`);
    await queryRunner.query(`
      CREATE INDEX tickets_worked_day_idx ON tickets (visit_day)
        INCLUDE (stop_id, route_day_id, opened_by, kind, subtotal_cents, shear_count)
        WHERE status IN ('finished', 'handed-back')`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX tickets_worked_day_idx`);
    await queryRunner.query(`ALTER TABLE tickets DROP COLUMN shear_count`);
    await queryRunner.query(`
      CREATE INDEX tickets_worked_day_idx ON tickets (visit_day)
        INCLUDE (stop_id, route_day_id, opened_by, kind, subtotal_cents)
        WHERE status IN ('finished', 'handed-back')`);
  }
}

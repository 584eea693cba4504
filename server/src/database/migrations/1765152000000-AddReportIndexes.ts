import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Indexes for the owner's reports (server/src/reports): each report reads a date range of worked tickets, route days,
 * stop visits, invoices or payments, so each of those gets an index that starts with its date. The worked-tickets
 * index carries the columns the revenue reports add up, so a range of tickets is read from the index alone.
 */
export class AddReportIndexes1765152000000 implements MigrationInterface {
  name = 'AddReportIndexes1765152000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE INDEX tickets_worked_day_idx ON tickets (visit_day)
        INCLUDE (stop_id, route_day_id, opened_by, kind, subtotal_cents)
        WHERE status IN ('finished', 'handed-back')`);
    await queryRunner.query(`CREATE INDEX stop_visits_worked_on_idx ON stop_visits (worked_on)`);
    await queryRunner.query(`CREATE INDEX payments_recorded_at_idx ON payments (recorded_at)`);
    await queryRunner.query(`CREATE INDEX invoices_issue_date_idx ON invoices (issue_date) WHERE status <> 'draft'`);
    await queryRunner.query(`CREATE INDEX credit_notes_created_at_idx ON credit_notes (created_at)`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const index of [
      'credit_notes_created_at_idx',
      'invoices_issue_date_idx',
      'payments_recorded_at_idx',
      'stop_visits_worked_on_idx',
      'tickets_worked_day_idx',
    ]) {
      await queryRunner.query(`DROP INDEX ${index}`);
    }
  }
}

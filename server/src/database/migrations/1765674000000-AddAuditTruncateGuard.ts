import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * TRUNCATE skips row triggers, so the audit log's append-only trigger did not stop `TRUNCATE audit_entries`. A
 * statement trigger refuses it with the same message. Like the row trigger it guards against mistakes and scripts,
 * not against a database superuser, who can drop triggers.
 */
export class AddAuditTruncateGuard1765674000000 implements MigrationInterface {
  name = 'AddAuditTruncateGuard1765674000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TRIGGER audit_entries_no_truncate BEFORE TRUNCATE ON audit_entries
        FOR EACH STATEMENT EXECUTE FUNCTION audit_entries_append_only()`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TRIGGER audit_entries_no_truncate ON audit_entries`);
  }
}

import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The audit log the owner reads: sign-ins (and failed ones, by the e-mail typed), role changes, price overrides, voids,
 * credit notes and payments. No foreign keys, so an entry outlives what it names; a trigger refuses UPDATE and DELETE,
 * so the app can only add to it.
 */
export class CreateAuditEntries1765238400000 implements MigrationInterface {
  name = 'CreateAuditEntries1765238400000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE audit_entries (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        at timestamptz NOT NULL DEFAULT now(),
        actor_id uuid,
        actor_email varchar(254),
        action varchar(32) NOT NULL CHECK (action IN ('sign-in', 'sign-in-failed', 'user-invited', 'role-changed',
          'user-deactivated', 'user-reactivated', 'price-override', 'invoice-voided', 'credit-note-issued',
          'payment-recorded')),
        subject_type varchar(16) NOT NULL CHECK (subject_type IN ('user', 'ticket', 'invoice')),
        subject_id uuid,
        detail jsonb NOT NULL DEFAULT '{}',
        ip inet
      )`);
    await queryRunner.query(`CREATE INDEX audit_entries_at_idx ON audit_entries (at DESC)`);
    await queryRunner.query(`CREATE INDEX audit_entries_action_idx ON audit_entries (action, at DESC)`);
    await queryRunner.query(`CREATE INDEX audit_entries_actor_idx ON audit_entries (actor_id, at DESC)`);
    await queryRunner.query(`CREATE INDEX audit_entries_subject_idx ON audit_entries (subject_id)`);
    await queryRunner.query(`
      CREATE FUNCTION audit_entries_append_only() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        RAISE EXCEPTION 'audit_entries is append-only';
      END $$`);
    await queryRunner.query(`
      CREATE TRIGGER audit_entries_append_only BEFORE UPDATE OR DELETE ON audit_entries
        FOR EACH ROW EXECUTE FUNCTION audit_entries_append_only()`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE audit_entries`);
    await queryRunner.query(`DROP FUNCTION audit_entries_append_only()`);
  }
}

import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Outgoing e-mail goes through a queue (src/mail): the outbox rows, and 'queued' in the invoice send log. */
export class CreateMailOutbox1765501200000 implements MigrationInterface {
  name = 'CreateMailOutbox1765501200000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE mail_outbox (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        key varchar(200) NOT NULL UNIQUE,
        topic varchar(40) NOT NULL,
        ref_id uuid,
        to_email varchar(254) NOT NULL,
        to_name varchar(200),
        subject varchar(300) NOT NULL,
        text text NOT NULL,
        html text,
        attachment jsonb,
        status varchar(16) NOT NULL DEFAULT 'queued' CHECK (status IN ('queued', 'sent', 'failed')),
        attempts integer NOT NULL DEFAULT 0 CHECK (attempts >= 0),
        last_error varchar(500),
        sent_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`CREATE INDEX mail_outbox_queued_idx ON mail_outbox (created_at) WHERE status = 'queued'`);
    await queryRunner.query(`
      ALTER TABLE invoice_mails
        DROP CONSTRAINT invoice_mails_status_check,
        ADD CONSTRAINT invoice_mails_status_check CHECK (status IN ('queued', 'sent', 'failed'))`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `UPDATE invoice_mails SET status = 'failed', error = 'Never sent.' WHERE status = 'queued'`,
    );
    await queryRunner.query(`
      ALTER TABLE invoice_mails
        DROP CONSTRAINT invoice_mails_status_check,
        ADD CONSTRAINT invoice_mails_status_check CHECK (status IN ('sent', 'failed'))`);
    await queryRunner.query(`DROP TABLE mail_outbox`);
  }
}

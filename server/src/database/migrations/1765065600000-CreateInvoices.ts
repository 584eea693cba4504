import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Invoices and payments: the business profile printed on them, gapless document numbers per series and year, invoices
 * made from finished tickets, credit notes, payments against invoices (on site, by the office, or online through the
 * payment service), the payment service's checkouts and webhook events, reminders and the send log. Money is cents.
 */
export class CreateInvoices1765065600000 implements MigrationInterface {
  name = 'CreateInvoices1765065600000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE business_profile (
        id smallint PRIMARY KEY DEFAULT 1 CHECK (id = 1),
        name varchar(120) NOT NULL DEFAULT '',
        street varchar(200) NOT NULL DEFAULT '',
        city varchar(100) NOT NULL DEFAULT '',
        region varchar(100) NOT NULL DEFAULT '',
        postal_code varchar(20) NOT NULL DEFAULT '',
        country varchar(2) NOT NULL DEFAULT 'US',
        phone varchar(40) NOT NULL DEFAULT '',
        email varchar(254) NOT NULL DEFAULT '',
        website varchar(200) NOT NULL DEFAULT '',
        tax_id varchar(40) NOT NULL DEFAULT '',
        logo_file varchar(200),
        invoice_footer varchar(1000) NOT NULL DEFAULT '',
        payment_terms_days smallint NOT NULL DEFAULT 14 CHECK (payment_terms_days BETWEEN 0 AND 120),
        reminder_days smallint[] NOT NULL DEFAULT '{7,21,45}',
        updated_by uuid REFERENCES users (id) ON DELETE SET NULL,
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`INSERT INTO business_profile (id) VALUES (1)`);
    // One row per series and year; the number is taken inside the issuing transaction, so a rollback gives it back.
    await queryRunner.query(`
      CREATE TABLE document_counters (
        series varchar(8) NOT NULL,
        year smallint NOT NULL,
        last_number integer NOT NULL CHECK (last_number > 0),
        PRIMARY KEY (series, year)
      )`);
    await queryRunner.query(`
      CREATE TABLE invoices (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        number varchar(20) UNIQUE,
        status varchar(16) NOT NULL DEFAULT 'draft' CHECK (status IN ('draft', 'sent', 'part-paid', 'paid', 'void')),
        bill_to varchar(16) NOT NULL CHECK (bill_to IN ('customer', 'stop')),
        customer_id uuid REFERENCES customers (id) ON DELETE RESTRICT,
        stop_id uuid REFERENCES stops (id) ON DELETE RESTRICT,
        bill_to_name varchar(120) NOT NULL DEFAULT '',
        bill_to_email varchar(254),
        bill_to_address varchar(500) NOT NULL DEFAULT '',
        currency varchar(3) NOT NULL DEFAULT 'USD',
        issue_date date,
        due_date date,
        terms_days smallint NOT NULL DEFAULT 14,
        discount_bp integer NOT NULL DEFAULT 0 CHECK (discount_bp BETWEEN 0 AND 10000),
        discount_cents integer NOT NULL DEFAULT 0 CHECK (discount_cents >= 0),
        lines_cents integer NOT NULL DEFAULT 0,
        discount_total_cents integer NOT NULL DEFAULT 0 CHECK (discount_total_cents >= 0),
        subtotal_cents integer NOT NULL DEFAULT 0 CHECK (subtotal_cents >= 0),
        tax_cents integer NOT NULL DEFAULT 0 CHECK (tax_cents >= 0),
        total_cents integer NOT NULL DEFAULT 0 CHECK (total_cents >= 0),
        tax_groups jsonb NOT NULL DEFAULT '[]',
        paid_cents integer NOT NULL DEFAULT 0 CHECK (paid_cents >= 0),
        credited_cents integer NOT NULL DEFAULT 0 CHECK (credited_cents >= 0),
        notes varchar(2000) NOT NULL DEFAULT '',
        void_reason varchar(500),
        voided_at timestamptz,
        voided_by uuid REFERENCES users (id) ON DELETE SET NULL,
        sent_at timestamptz,
        created_by uuid REFERENCES users (id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        version integer NOT NULL DEFAULT 1,
        CHECK ((bill_to = 'customer' AND customer_id IS NOT NULL) OR (bill_to = 'stop' AND stop_id IS NOT NULL)),
        CHECK (status = 'draft' OR number IS NOT NULL),
        CHECK (status <> 'void' OR void_reason IS NOT NULL)
      )`);
    await queryRunner.query(`CREATE INDEX invoices_customer_idx ON invoices (customer_id, created_at DESC)`);
    await queryRunner.query(`CREATE INDEX invoices_stop_idx ON invoices (stop_id, created_at DESC)`);
    await queryRunner.query(
      `CREATE INDEX invoices_open_due_idx ON invoices (due_date) WHERE status IN ('sent', 'part-paid')`,
    );
    // A ticket sits on at most one invoice that is not void; voiding releases it to be invoiced again.
    await queryRunner.query(
      `ALTER TABLE tickets ADD COLUMN invoice_id uuid REFERENCES invoices (id) ON DELETE SET NULL`,
    );
    await queryRunner.query(`CREATE INDEX tickets_invoice_idx ON tickets (invoice_id)`);
    await queryRunner.query(`
      CREATE TABLE invoice_lines (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        invoice_id uuid NOT NULL REFERENCES invoices (id) ON DELETE CASCADE,
        ticket_id uuid REFERENCES tickets (id) ON DELETE RESTRICT,
        ticket_line_id uuid REFERENCES ticket_lines (id) ON DELETE SET NULL,
        position smallint NOT NULL,
        kind varchar(16) NOT NULL CHECK (kind IN ('shear', 'adjustment')),
        description varchar(500) NOT NULL,
        amount_cents integer NOT NULL,
        taxable boolean NOT NULL DEFAULT true,
        tax_rate_bp integer NOT NULL DEFAULT 0,
        UNIQUE (invoice_id, position)
      )`);
    await queryRunner.query(`
      CREATE TABLE credit_notes (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        number varchar(20) NOT NULL UNIQUE,
        invoice_id uuid NOT NULL REFERENCES invoices (id) ON DELETE RESTRICT,
        amount_cents integer NOT NULL CHECK (amount_cents > 0),
        reason varchar(500) NOT NULL,
        refund_method varchar(16) NOT NULL DEFAULT 'none'
          CHECK (refund_method IN ('none', 'cash', 'cheque', 'card-terminal', 'online')),
        created_by uuid REFERENCES users (id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`CREATE INDEX credit_notes_invoice_idx ON credit_notes (invoice_id)`);
    await queryRunner.query(`ALTER TABLE payments DROP CONSTRAINT IF EXISTS payments_method_check`);
    await queryRunner.query(`
      ALTER TABLE payments
        ADD COLUMN invoice_id uuid REFERENCES invoices (id) ON DELETE RESTRICT,
        ADD COLUMN external_id varchar(120) UNIQUE,
        ADD COLUMN receipt_sent_at timestamptz,
        ADD CONSTRAINT payments_method_check CHECK (method IN ('cash', 'cheque', 'card-terminal', 'online')),
        ADD CONSTRAINT payments_target_check CHECK (ticket_id IS NOT NULL OR invoice_id IS NOT NULL),
        ADD CONSTRAINT payments_online_check CHECK (method <> 'online' OR external_id IS NOT NULL)`);
    await queryRunner.query(`CREATE INDEX payments_invoice_idx ON payments (invoice_id, recorded_at)`);
    await queryRunner.query(`
      CREATE TABLE invoice_checkouts (
        id varchar(120) PRIMARY KEY,
        invoice_id uuid NOT NULL REFERENCES invoices (id) ON DELETE RESTRICT,
        amount_cents integer NOT NULL CHECK (amount_cents > 0),
        currency varchar(3) NOT NULL,
        url varchar(1000) NOT NULL,
        status varchar(16) NOT NULL DEFAULT 'open' CHECK (status IN ('open', 'complete', 'expired')),
        created_at timestamptz NOT NULL DEFAULT now(),
        completed_at timestamptz
      )`);
    await queryRunner.query(
      `CREATE INDEX invoice_checkouts_invoice_idx ON invoice_checkouts (invoice_id, created_at DESC)`,
    );
    // Every webhook event id seen: a repeat is acknowledged and ignored.
    await queryRunner.query(`
      CREATE TABLE payment_events (
        id varchar(120) PRIMARY KEY,
        type varchar(80) NOT NULL,
        created timestamptz NOT NULL,
        invoice_id uuid REFERENCES invoices (id) ON DELETE SET NULL,
        received_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`
      CREATE TABLE invoice_reminders (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        invoice_id uuid NOT NULL REFERENCES invoices (id) ON DELETE CASCADE,
        stage_days smallint NOT NULL CHECK (stage_days > 0),
        status varchar(16) NOT NULL DEFAULT 'pending'
          CHECK (status IN ('pending', 'sent', 'skipped', 'cancelled', 'failed')),
        attempts smallint NOT NULL DEFAULT 0,
        last_error varchar(500),
        created_at timestamptz NOT NULL DEFAULT now(),
        sent_at timestamptz,
        UNIQUE (invoice_id, stage_days)
      )`);
    await queryRunner.query(`
      CREATE TABLE invoice_mails (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        invoice_id uuid REFERENCES invoices (id) ON DELETE CASCADE,
        payment_id uuid REFERENCES payments (id) ON DELETE SET NULL,
        kind varchar(16) NOT NULL CHECK (kind IN ('invoice', 'reminder', 'receipt', 'statement')),
        to_email varchar(254) NOT NULL,
        subject varchar(300) NOT NULL,
        status varchar(16) NOT NULL CHECK (status IN ('sent', 'failed')),
        error varchar(500),
        sent_by uuid REFERENCES users (id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`CREATE INDEX invoice_mails_invoice_idx ON invoice_mails (invoice_id, created_at DESC)`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE invoice_mails`);
    await queryRunner.query(`DROP TABLE invoice_reminders`);
    await queryRunner.query(`DROP TABLE payment_events`);
    await queryRunner.query(`DROP TABLE invoice_checkouts`);
    await queryRunner.query(`DELETE FROM payments WHERE ticket_id IS NULL`);
    await queryRunner.query(`
      ALTER TABLE payments
        DROP CONSTRAINT payments_online_check,
        DROP CONSTRAINT payments_target_check,
        DROP CONSTRAINT payments_method_check,
        DROP COLUMN receipt_sent_at,
        DROP COLUMN external_id,
        DROP COLUMN invoice_id`);
    await queryRunner.query(`
      ALTER TABLE payments ADD CONSTRAINT payments_method_check CHECK (method IN ('cash', 'cheque', 'card-terminal'))`);
    await queryRunner.query(`DROP TABLE credit_notes`);
    await queryRunner.query(`DROP TABLE invoice_lines`);
    await queryRunner.query(`ALTER TABLE tickets DROP COLUMN invoice_id`);
    await queryRunner.query(`DROP TABLE invoices`);
    await queryRunner.query(`DROP TABLE document_counters`);
    await queryRunner.query(`DROP TABLE business_profile`);
  }
}

import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Tickets: one customer's shears on one visit or drop-off, a line per shear with its rules price, the audit of price
 * overrides, payments recorded on site, and before/after photos tied to a ticket line. Money is integer cents.
 */
export class CreateTickets1764979200001 implements MigrationInterface {
  name = 'CreateTickets1764979200001';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE tickets (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        customer_id uuid NOT NULL REFERENCES customers (id) ON DELETE RESTRICT,
        stop_id uuid REFERENCES stops (id) ON DELETE RESTRICT,
        route_day_id uuid REFERENCES route_days (id) ON DELETE SET NULL,
        booking_id uuid UNIQUE REFERENCES bookings (id) ON DELETE SET NULL,
        kind varchar(16) NOT NULL CHECK (kind IN ('visit', 'drop-off', 'walk-up')),
        status varchar(16) NOT NULL DEFAULT 'open' CHECK (status IN ('open', 'finished', 'handed-back')),
        visit_day date NOT NULL,
        notes varchar(2000) NOT NULL DEFAULT '',
        expected jsonb NOT NULL DEFAULT '[]',
        charge_trip boolean NOT NULL DEFAULT false,
        currency varchar(3) NOT NULL DEFAULT 'USD',
        tax_rate_bp integer NOT NULL DEFAULT 0,
        services_taxable boolean NOT NULL DEFAULT true,
        rate_card_version integer,
        rules_subtotal_cents integer NOT NULL DEFAULT 0 CHECK (rules_subtotal_cents >= 0),
        subtotal_cents integer NOT NULL DEFAULT 0 CHECK (subtotal_cents >= 0),
        tax_cents integer NOT NULL DEFAULT 0 CHECK (tax_cents >= 0),
        total_cents integer NOT NULL DEFAULT 0 CHECK (total_cents >= 0),
        price_summary jsonb NOT NULL DEFAULT '[]',
        settlement varchar(16) NOT NULL DEFAULT 'unpaid' CHECK (settlement IN ('unpaid', 'paid-on-site', 'to-invoice')),
        opened_by uuid REFERENCES users (id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        finished_at timestamptz,
        handed_back_at timestamptz,
        CHECK (NOT charge_trip OR stop_id IS NOT NULL)
      )`);
    // One trip charge per stop visit: the first ticket at a stop on a day carries it, and the index makes a second impossible.
    await queryRunner.query(
      `CREATE UNIQUE INDEX tickets_one_trip_charge_idx ON tickets (stop_id, visit_day) WHERE charge_trip`,
    );
    await queryRunner.query(`CREATE INDEX tickets_visit_day_idx ON tickets (visit_day, stop_id)`);
    await queryRunner.query(`CREATE INDEX tickets_customer_idx ON tickets (customer_id, created_at DESC)`);
    await queryRunner.query(`CREATE INDEX tickets_route_day_idx ON tickets (route_day_id)`);
    await queryRunner.query(`
      CREATE TABLE ticket_lines (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        ticket_id uuid NOT NULL REFERENCES tickets (id) ON DELETE CASCADE,
        shear_id uuid NOT NULL REFERENCES shears (id) ON DELETE RESTRICT,
        add_ons varchar(32)[] NOT NULL DEFAULT '{}',
        price_cents integer NOT NULL DEFAULT 0 CHECK (price_cents >= 0),
        explanation varchar(500) NOT NULL DEFAULT '',
        override_cents integer CHECK (override_cents >= 0),
        override_reason varchar(500),
        bench_status varchar(16) NOT NULL DEFAULT 'waiting'
          CHECK (bench_status IN ('waiting', 'on-the-bench', 'ready', 'handed-back')),
        notes varchar(2000) NOT NULL DEFAULT '',
        position smallint NOT NULL CHECK (position >= 0),
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        UNIQUE (ticket_id, shear_id),
        CHECK ((override_cents IS NULL) = (override_reason IS NULL))
      )`);
    await queryRunner.query(`CREATE INDEX ticket_lines_shear_idx ON ticket_lines (shear_id)`);
    // The audit outlives a removed line: it keeps the ticket and the shear, and the line id goes null.
    await queryRunner.query(`
      CREATE TABLE ticket_line_overrides (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        ticket_id uuid NOT NULL REFERENCES tickets (id) ON DELETE CASCADE,
        ticket_line_id uuid REFERENCES ticket_lines (id) ON DELETE SET NULL,
        shear_id uuid NOT NULL REFERENCES shears (id) ON DELETE CASCADE,
        from_cents integer NOT NULL,
        to_cents integer NOT NULL CHECK (to_cents >= 0),
        reason varchar(500) NOT NULL CHECK (length(trim(reason)) > 0),
        by_user uuid REFERENCES users (id) ON DELETE SET NULL,
        at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`CREATE INDEX ticket_line_overrides_ticket_idx ON ticket_line_overrides (ticket_id, at)`);
    await queryRunner.query(`
      CREATE TABLE payments (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        ticket_id uuid REFERENCES tickets (id) ON DELETE RESTRICT,
        method varchar(16) NOT NULL CHECK (method IN ('cash', 'cheque', 'card-terminal')),
        amount_cents integer NOT NULL CHECK (amount_cents > 0),
        reference varchar(60) NOT NULL DEFAULT '',
        recorded_by uuid REFERENCES users (id) ON DELETE SET NULL,
        recorded_at timestamptz NOT NULL DEFAULT now(),
        CHECK (method = 'cash' OR length(trim(reference)) > 0)
      )`);
    await queryRunner.query(`CREATE INDEX payments_ticket_idx ON payments (ticket_id, recorded_at)`);
    await queryRunner.query(`
      ALTER TABLE shear_photos
        ADD COLUMN ticket_line_id uuid REFERENCES ticket_lines (id) ON DELETE SET NULL,
        ADD COLUMN stage varchar(8) CHECK (stage IN ('before', 'after'))`);
    await queryRunner.query(`CREATE INDEX shear_photos_ticket_line_idx ON shear_photos (ticket_line_id)`);
    await queryRunner.query(`
      ALTER TABLE shear_history
        ADD CONSTRAINT shear_history_ticket_fk FOREIGN KEY (ticket_id) REFERENCES tickets (id) ON DELETE SET NULL`);
    await queryRunner.query(`
      ALTER TABLE bookings
        ADD CONSTRAINT bookings_ticket_fk FOREIGN KEY (ticket_id) REFERENCES tickets (id) ON DELETE SET NULL`);
    // A ticket's service row is written once per shear, even if finishing were retried.
    await queryRunner.query(
      `CREATE UNIQUE INDEX shear_history_serviced_once_idx ON shear_history (ticket_id, shear_id) WHERE kind = 'serviced'`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX shear_history_serviced_once_idx`);
    await queryRunner.query(`ALTER TABLE bookings DROP CONSTRAINT bookings_ticket_fk`);
    await queryRunner.query(`ALTER TABLE shear_history DROP CONSTRAINT shear_history_ticket_fk`);
    // The tickets go; ids pointing at them would stop the next migration run from adding the foreign keys again.
    await queryRunner.query(`UPDATE bookings SET ticket_id = NULL WHERE ticket_id IS NOT NULL`);
    await queryRunner.query(`UPDATE shear_history SET ticket_id = NULL WHERE ticket_id IS NOT NULL`);
    await queryRunner.query(`ALTER TABLE shear_photos DROP COLUMN stage, DROP COLUMN ticket_line_id`);
    await queryRunner.query(`DROP TABLE payments`);
    await queryRunner.query(`DROP TABLE ticket_line_overrides`);
    await queryRunner.query(`DROP TABLE ticket_lines`);
    await queryRunner.query(`DROP TABLE tickets`);
  }
}

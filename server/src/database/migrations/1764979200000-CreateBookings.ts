import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Drop-offs booked online: one row per booking with its shears by kind, and the booking cutoff in the planning
 * settings. Only the sha256 of the private manage link's token is kept; the idempotency key makes a resubmitted form
 * find the booking it already made.
 */
export class CreateBookings1764979200000 implements MigrationInterface {
  name = 'CreateBookings1764979200000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE bookings (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        stop_id uuid NOT NULL REFERENCES stops (id) ON DELETE RESTRICT,
        route_day_id uuid REFERENCES route_days (id) ON DELETE SET NULL,
        day date,
        mail_in boolean NOT NULL DEFAULT false,
        status varchar(16) NOT NULL DEFAULT 'booked' CHECK (status IN ('booked', 'cancelled', 'checked-in')),
        name varchar(120) NOT NULL,
        email varchar(254) NOT NULL,
        phone varchar(40) NOT NULL,
        notes varchar(1000) NOT NULL DEFAULT '',
        consent boolean NOT NULL,
        customer_id uuid REFERENCES customers (id) ON DELETE SET NULL,
        manage_token_hash char(64) NOT NULL UNIQUE,
        idempotency_key uuid NOT NULL UNIQUE,
        bench_minutes integer NOT NULL CHECK (bench_minutes >= 0),
        estimate_cents integer CHECK (estimate_cents >= 0),
        ticket_id uuid,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        cancelled_at timestamptz,
        CHECK (NOT mail_in OR (route_day_id IS NULL AND day IS NULL))
      )`);
    await queryRunner.query(`CREATE INDEX bookings_route_day_idx ON bookings (route_day_id)`);
    await queryRunner.query(`CREATE INDEX bookings_stop_day_idx ON bookings (stop_id, day)`);
    await queryRunner.query(`CREATE INDEX bookings_email_idx ON bookings (lower(email))`);
    await queryRunner.query(`
      CREATE TABLE booking_items (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        booking_id uuid NOT NULL REFERENCES bookings (id) ON DELETE CASCADE,
        position smallint NOT NULL CHECK (position >= 0),
        tool_kind varchar(16) NOT NULL,
        edge_type varchar(16) NOT NULL,
        count smallint NOT NULL CHECK (count BETWEEN 1 AND 50),
        shear_id uuid REFERENCES shears (id) ON DELETE SET NULL
      )`);
    await queryRunner.query(`CREATE INDEX booking_items_booking_idx ON booking_items (booking_id)`);
    await queryRunner.query(`
      ALTER TABLE planning_settings
        ADD COLUMN booking_cutoff_days_before smallint NOT NULL DEFAULT 1
          CHECK (booking_cutoff_days_before BETWEEN 0 AND 14),
        ADD COLUMN booking_cutoff_hour smallint NOT NULL DEFAULT 18 CHECK (booking_cutoff_hour BETWEEN 0 AND 23)`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE planning_settings DROP COLUMN booking_cutoff_hour, DROP COLUMN booking_cutoff_days_before`,
    );
    await queryRunner.query(`DROP TABLE booking_items`);
    await queryRunner.query(`DROP TABLE bookings`);
  }
}

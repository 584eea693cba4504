import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Route days: the planning settings, one sharpener's day on the road with its stops in order, the week plan's
 * unplanned stops, the sharpeners' calendar feeds and the visit notices sent (one row per stop, day and recipient, so
 * a notice goes out exactly once). Times of day are minutes after midnight in the business's time zone.
 */
export class CreateRouteDays1764892800000 implements MigrationInterface {
  name = 'CreateRouteDays1764892800000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE planning_settings (
        id smallint PRIMARY KEY DEFAULT 1 CHECK (id = 1),
        base_label varchar(200) NOT NULL,
        base_latitude double precision NOT NULL CHECK (base_latitude BETWEEN -90 AND 90),
        base_longitude double precision NOT NULL CHECK (base_longitude BETWEEN -180 AND 180),
        work_weekdays varchar(3)[] NOT NULL DEFAULT '{mon,tue,wed,thu,fri}',
        shift_start smallint NOT NULL DEFAULT 480 CHECK (shift_start BETWEEN 0 AND 1439),
        latest_finish smallint NOT NULL DEFAULT 1080 CHECK (latest_finish BETWEEN 1 AND 1440),
        lunch_earliest smallint NOT NULL DEFAULT 690 CHECK (lunch_earliest BETWEEN 0 AND 1439),
        lunch_latest smallint NOT NULL DEFAULT 810 CHECK (lunch_latest BETWEEN 0 AND 1439),
        lunch_minutes smallint NOT NULL DEFAULT 30 CHECK (lunch_minutes BETWEEN 0 AND 180),
        circuity numeric(3, 2) NOT NULL DEFAULT 1.3 CHECK (circuity BETWEEN 1 AND 2),
        average_speed_kmh smallint NOT NULL DEFAULT 40 CHECK (average_speed_kmh BETWEEN 5 AND 130),
        notice_days smallint NOT NULL DEFAULT 3 CHECK (notice_days BETWEEN 0 AND 28),
        solve_seconds smallint NOT NULL DEFAULT 3 CHECK (solve_seconds BETWEEN 1 AND 30),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CHECK (shift_start < latest_finish),
        CHECK (lunch_earliest <= lunch_latest)
      )`);
    await queryRunner.query(`
      CREATE TABLE route_days (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        sharpener_id uuid NOT NULL REFERENCES users (id) ON DELETE RESTRICT,
        day date NOT NULL,
        start_label varchar(200) NOT NULL,
        start_latitude double precision NOT NULL,
        start_longitude double precision NOT NULL,
        shift_start smallint NOT NULL,
        latest_finish smallint NOT NULL,
        lunch_earliest smallint NOT NULL,
        lunch_latest smallint NOT NULL,
        lunch_minutes smallint NOT NULL,
        lunch_start smallint,
        lunch_after smallint,
        departure smallint,
        finish smallint,
        distance_km double precision NOT NULL DEFAULT 0,
        drive_minutes integer NOT NULL DEFAULT 0,
        bench_minutes integer NOT NULL DEFAULT 0,
        version integer NOT NULL DEFAULT 1,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        UNIQUE (sharpener_id, day)
      )`);
    await queryRunner.query(`CREATE INDEX route_days_day_idx ON route_days (day)`);
    await queryRunner.query(`
      CREATE TABLE route_day_stops (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        route_day_id uuid NOT NULL REFERENCES route_days (id) ON DELETE CASCADE,
        stop_id uuid NOT NULL REFERENCES stops (id) ON DELETE CASCADE,
        position smallint NOT NULL CHECK (position >= 0),
        arrival smallint NOT NULL,
        start smallint NOT NULL,
        leave smallint NOT NULL,
        bench_minutes smallint NOT NULL CHECK (bench_minutes >= 0),
        drive_minutes_before integer NOT NULL DEFAULT 0,
        km_before double precision NOT NULL DEFAULT 0,
        problem varchar(32),
        locked boolean NOT NULL DEFAULT false,
        position_locked boolean NOT NULL DEFAULT false,
        UNIQUE (route_day_id, stop_id),
        CHECK (locked OR NOT position_locked)
      )`);
    await queryRunner.query(`CREATE INDEX route_day_stops_stop_idx ON route_day_stops (stop_id)`);
    await queryRunner.query(`
      CREATE TABLE route_week_plans (
        week_start date PRIMARY KEY,
        unplanned jsonb NOT NULL DEFAULT '[]',
        planned_by uuid REFERENCES users (id) ON DELETE SET NULL,
        planned_at timestamptz NOT NULL DEFAULT now(),
        solve_ms integer NOT NULL DEFAULT 0
      )`);
    await queryRunner.query(`
      CREATE TABLE calendar_feeds (
        user_id uuid PRIMARY KEY REFERENCES users (id) ON DELETE CASCADE,
        token varchar(64) NOT NULL UNIQUE,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`
      CREATE TABLE visit_notices (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        stop_id uuid NOT NULL REFERENCES stops (id) ON DELETE CASCADE,
        day date NOT NULL,
        recipient varchar(254) NOT NULL,
        customer_id uuid REFERENCES customers (id) ON DELETE SET NULL,
        status varchar(16) NOT NULL DEFAULT 'pending' CHECK (status IN ('pending', 'sent', 'failed')),
        attempts smallint NOT NULL DEFAULT 0,
        last_error varchar(500),
        sent_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        UNIQUE (stop_id, day, recipient)
      )`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE visit_notices`);
    await queryRunner.query(`DROP TABLE calendar_feeds`);
    await queryRunner.query(`DROP TABLE route_week_plans`);
    await queryRunner.query(`DROP TABLE route_day_stops`);
    await queryRunner.query(`DROP TABLE route_days`);
    await queryRunner.query(`DROP TABLE planning_settings`);
  }
}

import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Stops, their worked visits, customers (with their moves between stops), shears, photos and service history. */
export class CreateRegistry1764806400000 implements MigrationInterface {
  name = 'CreateRegistry1764806400000';

  async up(queryRunner: QueryRunner): Promise<void> {
    // Trigram indexes let ILIKE '%text%' searches on names, addresses and tag codes use an index.
    await queryRunner.query(`CREATE EXTENSION IF NOT EXISTS pg_trgm`);
    await queryRunner.query(`
      CREATE TABLE stops (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        name varchar(120) NOT NULL,
        kind varchar(16) NOT NULL
          CHECK (kind IN ('salon', 'barbershop', 'grooming-shop', 'school', 'clinic', 'other')),
        street varchar(200) NOT NULL,
        city varchar(100) NOT NULL,
        region varchar(100) NOT NULL DEFAULT '',
        postal_code varchar(20) NOT NULL DEFAULT '',
        country varchar(2) NOT NULL DEFAULT 'US',
        latitude double precision CHECK (latitude BETWEEN -90 AND 90),
        longitude double precision CHECK (longitude BETWEEN -180 AND 180),
        geocode_status varchar(16) NOT NULL DEFAULT 'none'
          CHECK (geocode_status IN ('none', 'found', 'picked', 'manual', 'ambiguous', 'failed')),
        phone varchar(40),
        email varchar(254),
        opening_hours jsonb NOT NULL DEFAULT '{}',
        closed_dates date[] NOT NULL DEFAULT '{}',
        cadence_weeks smallint NOT NULL CHECK (cadence_weeks BETWEEN 1 AND 52),
        preferred_weekdays varchar(3)[] NOT NULL DEFAULT '{}',
        billing_mode varchar(16) NOT NULL DEFAULT 'customer' CHECK (billing_mode IN ('customer', 'stop')),
        tax_rate_bp integer NOT NULL DEFAULT 0 CHECK (tax_rate_bp BETWEEN 0 AND 3000),
        access_parking varchar(500) NOT NULL DEFAULT '',
        access_door varchar(500) NOT NULL DEFAULT '',
        access_best_time varchar(500) NOT NULL DEFAULT '',
        assigned_sharpener_id uuid REFERENCES users (id) ON DELETE SET NULL,
        manager_user_id uuid REFERENCES users (id) ON DELETE SET NULL,
        active boolean NOT NULL DEFAULT true,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CHECK ((latitude IS NULL) = (longitude IS NULL))
      )`);
    // One stop per name and address: the duplicate rule of forms and imports.
    await queryRunner.query(
      `CREATE UNIQUE INDEX stops_name_address_key ON stops (lower(name), lower(street), lower(city), lower(postal_code))`,
    );
    await queryRunner.query(`CREATE INDEX stops_name_trgm ON stops USING gin (name gin_trgm_ops)`);
    await queryRunner.query(
      `CREATE INDEX stops_address_trgm ON stops USING gin ((street || ' ' || city || ' ' || postal_code) gin_trgm_ops)`,
    );
    await queryRunner.query(`CREATE INDEX stops_assigned_sharpener_idx ON stops (assigned_sharpener_id)`);
    await queryRunner.query(`CREATE INDEX stops_manager_user_idx ON stops (manager_user_id)`);

    await queryRunner.query(`
      CREATE TABLE stop_visits (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        stop_id uuid NOT NULL REFERENCES stops (id) ON DELETE CASCADE,
        worked_on date NOT NULL,
        sharpener_id uuid REFERENCES users (id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`CREATE INDEX stop_visits_stop_worked_idx ON stop_visits (stop_id, worked_on DESC)`);

    await queryRunner.query(`
      CREATE TABLE customers (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        name varchar(120) NOT NULL,
        email varchar(254),
        phone varchar(40),
        stop_id uuid REFERENCES stops (id) ON DELETE RESTRICT,
        user_id uuid UNIQUE REFERENCES users (id) ON DELETE SET NULL,
        notes varchar(2000) NOT NULL DEFAULT '',
        visit_notice_consent boolean NOT NULL DEFAULT false,
        active boolean NOT NULL DEFAULT true,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX customers_email_key ON customers (lower(email)) WHERE email IS NOT NULL`,
    );
    await queryRunner.query(`CREATE INDEX customers_name_trgm ON customers USING gin (name gin_trgm_ops)`);
    await queryRunner.query(`CREATE INDEX customers_stop_idx ON customers (stop_id)`);

    // Where a customer worked and when: a move closes one row and opens the next.
    await queryRunner.query(`
      CREATE TABLE customer_stop_history (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        customer_id uuid NOT NULL REFERENCES customers (id) ON DELETE CASCADE,
        stop_id uuid NOT NULL REFERENCES stops (id) ON DELETE CASCADE,
        started_at timestamptz NOT NULL DEFAULT now(),
        ended_at timestamptz
      )`);
    await queryRunner.query(
      `CREATE INDEX customer_stop_history_customer_idx ON customer_stop_history (customer_id, started_at DESC)`,
    );

    await queryRunner.query(`CREATE SEQUENCE shear_tag_serial START 1`);
    await queryRunner.query(`
      CREATE TABLE shears (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        tag_code varchar(20) NOT NULL UNIQUE CHECK (tag_code ~ '^KR-[0-9]{6,}$'),
        customer_id uuid NOT NULL REFERENCES customers (id) ON DELETE RESTRICT,
        make varchar(80) NOT NULL DEFAULT '',
        model varchar(80) NOT NULL DEFAULT '',
        length_in numeric(4, 2) NOT NULL CHECK (length_in BETWEEN 3 AND 12 AND length_in * 4 = trunc(length_in * 4)),
        edge_type varchar(16) NOT NULL CHECK (edge_type IN ('beveled', 'convex', 'semi-convex', 'serrated')),
        tool_kind varchar(16) NOT NULL
          CHECK (tool_kind IN ('straight', 'curved', 'thinning', 'blending', 'chunker')),
        handedness varchar(8) NOT NULL DEFAULT 'right' CHECK (handedness IN ('right', 'left')),
        use varchar(16) NOT NULL DEFAULT 'hair' CHECK (use IN ('hair', 'grooming')),
        notes varchar(2000) NOT NULL DEFAULT '',
        status varchar(16) NOT NULL DEFAULT 'in-service' CHECK (status IN ('in-service', 'retired', 'lost')),
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`CREATE INDEX shears_customer_idx ON shears (customer_id)`);
    await queryRunner.query(`CREATE INDEX shears_tag_code_trgm ON shears USING gin (tag_code gin_trgm_ops)`);

    await queryRunner.query(`
      CREATE TABLE shear_photos (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        shear_id uuid NOT NULL REFERENCES shears (id) ON DELETE CASCADE,
        content_type varchar(20) NOT NULL CHECK (content_type IN ('image/jpeg', 'image/png', 'image/webp')),
        byte_size integer NOT NULL,
        width integer NOT NULL,
        height integer NOT NULL,
        uploaded_by uuid REFERENCES users (id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`CREATE INDEX shear_photos_shear_idx ON shear_photos (shear_id, created_at)`);

    // The shear's service history: registered, status changes, and (from tickets) each time it was sharpened.
    await queryRunner.query(`
      CREATE TABLE shear_history (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        shear_id uuid NOT NULL REFERENCES shears (id) ON DELETE CASCADE,
        happened_on date NOT NULL,
        kind varchar(16) NOT NULL CHECK (kind IN ('registered', 'serviced', 'status', 'moved', 'note')),
        summary varchar(500) NOT NULL,
        ticket_id uuid,
        recorded_by uuid REFERENCES users (id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`CREATE INDEX shear_history_shear_idx ON shear_history (shear_id, happened_on DESC)`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const table of [
      'shear_history',
      'shear_photos',
      'shears',
      'customer_stop_history',
      'customers',
      'stop_visits',
      'stops',
    ]) {
      await queryRunner.query(`DROP TABLE ${table}`);
    }
    await queryRunner.query(`DROP SEQUENCE shear_tag_serial`);
  }
}

import type { MigrationInterface, QueryRunner } from 'typeorm';

/** CSV imports: the parsed file and its row errors between the preview and the commit. */
export class CreateCsvImports1764806400001 implements MigrationInterface {
  name = 'CreateCsvImports1764806400001';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE csv_imports (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        kind varchar(16) NOT NULL CHECK (kind IN ('stops', 'customers', 'shears')),
        file_name varchar(255) NOT NULL,
        rows jsonb NOT NULL,
        row_count integer NOT NULL CHECK (row_count >= 0),
        errors jsonb NOT NULL DEFAULT '[]',
        status varchar(16) NOT NULL DEFAULT 'previewed' CHECK (status IN ('previewed', 'committed')),
        created_by uuid REFERENCES users (id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        committed_at timestamptz,
        CHECK ((status = 'committed') = (committed_at IS NOT NULL))
      )`);
    await queryRunner.query(`CREATE INDEX csv_imports_created_by_idx ON csv_imports (created_by, created_at DESC)`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE csv_imports`);
  }
}

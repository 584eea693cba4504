import type { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateRateCards1764720000000 implements MigrationInterface {
  name = 'CreateRateCards1764720000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE rate_cards (
        version integer GENERATED ALWAYS AS IDENTITY PRIMARY KEY,
        card jsonb NOT NULL,
        created_by uuid REFERENCES users (id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE rate_cards`);
  }
}

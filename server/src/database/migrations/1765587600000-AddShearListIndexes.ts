import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Indexes for the shears list. Trigram indexes for the search's make and model, beside the tag code's and the
 * customer name's: a search that tested every shear with four ILIKEs took 60 ms on 15,000 shears. And the sort
 * orders by make and by date registered, each with its tag-code tie-break, so a page reads an index in order instead
 * of sorting every shear. docs/benchmarks.md has the figures.
 */
export class AddShearListIndexes1765587600000 implements MigrationInterface {
  name = 'AddShearListIndexes1765587600000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE INDEX shears_make_trgm ON shears USING gin (make gin_trgm_ops)`);
    await queryRunner.query(`CREATE INDEX shears_model_trgm ON shears USING gin (model gin_trgm_ops)`);
    await queryRunner.query(`CREATE INDEX shears_make_order_idx ON shears (make, tag_code)`);
    await queryRunner.query(`CREATE INDEX shears_created_order_idx ON shears (created_at, tag_code)`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX shears_created_order_idx`);
    await queryRunner.query(`DROP INDEX shears_make_order_idx`);
    await queryRunner.query(`DROP INDEX shears_model_trgm`);
    await queryRunner.query(`DROP INDEX shears_make_trgm`);
  }
}

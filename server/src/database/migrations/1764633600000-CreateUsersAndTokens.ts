import type { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateUsersAndTokens1764633600000 implements MigrationInterface {
  name = 'CreateUsersAndTokens1764633600000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE users (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        email varchar(254) NOT NULL,
        name varchar(120) NOT NULL,
        role varchar(16) NOT NULL CHECK (role IN ('owner', 'office', 'sharpener', 'client')),
        password_hash varchar(100),
        active boolean NOT NULL DEFAULT true,
        last_sign_in_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`CREATE UNIQUE INDEX users_email_lower_key ON users (lower(email))`);
    await queryRunner.query(`CREATE INDEX users_name_idx ON users (name)`);

    await queryRunner.query(`
      CREATE TABLE refresh_tokens (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        user_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
        token_hash char(64) NOT NULL,
        family_id uuid NOT NULL,
        expires_at timestamptz NOT NULL,
        revoked_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`CREATE UNIQUE INDEX refresh_tokens_token_hash_key ON refresh_tokens (token_hash)`);
    await queryRunner.query(`CREATE INDEX refresh_tokens_user_id_idx ON refresh_tokens (user_id)`);
    await queryRunner.query(`CREATE INDEX refresh_tokens_family_id_idx ON refresh_tokens (family_id)`);

    await queryRunner.query(`
      CREATE TABLE user_tokens (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        user_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
        purpose varchar(16) NOT NULL CHECK (purpose IN ('invite', 'reset')),
        token_hash char(64) NOT NULL,
        expires_at timestamptz NOT NULL,
        used_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`CREATE UNIQUE INDEX user_tokens_token_hash_key ON user_tokens (token_hash)`);
    await queryRunner.query(`CREATE INDEX user_tokens_user_id_idx ON user_tokens (user_id)`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE user_tokens`);
    await queryRunner.query(`DROP TABLE refresh_tokens`);
    await queryRunner.query(`DROP TABLE users`);
  }
}

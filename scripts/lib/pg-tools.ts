import { execFile } from 'node:child_process';
import { existsSync } from 'node:fs';
import path from 'node:path';
import { promisify } from 'node:util';
import { ensurePostgres } from './postgres-binaries.js';
import { SetupError } from './setup-error.js';

const execFileAsync = promisify(execFile);

export type PgTool = 'pg_dump' | 'pg_restore' | 'psql';

/** A client program from the newest PostgreSQL installed: pg_dump must be at least the server's version. */
export async function pgTool(name: PgTool): Promise<string> {
  const bins = await ensurePostgres();
  const binary = path.join(bins.binDir, name);
  if (!existsSync(binary)) {
    throw new SetupError(
      `${name} is missing from ${bins.binDir}. Install it with:  apt-get install -y postgresql-client`,
    );
  }
  return binary;
}

/**
 * libpq's own variables for a postgres:// address, so a password never lands in a command line (visible to every
 * user in the process list) or in an error message.
 */
export function libpqEnvironment(databaseUrl: string): NodeJS.ProcessEnv {
  const url = new URL(databaseUrl);
  const sslmode = url.searchParams.get('sslmode');
  return {
    ...process.env,
    PGHOST: decodeURIComponent(url.hostname) || '127.0.0.1',
    PGPORT: url.port || '5432',
    PGUSER: decodeURIComponent(url.username) || 'postgres',
    PGDATABASE: databaseName(databaseUrl),
    PGCONNECT_TIMEOUT: '10',
    ...(url.password ? { PGPASSWORD: decodeURIComponent(url.password) } : {}),
    ...(sslmode ? { PGSSLMODE: sslmode } : {}),
  };
}

export function databaseName(databaseUrl: string): string {
  const name = decodeURIComponent(new URL(databaseUrl).pathname.replace(/^\//, ''));
  if (!name) throw new SetupError('DATABASE_URL names no database: end it with /<database name>.');
  return name;
}

/** The same server's maintenance database, for creating or dropping the one named in the address. */
export function maintenanceUrl(databaseUrl: string): string {
  const url = new URL(databaseUrl);
  url.pathname = '/postgres';
  return url.toString();
}

/** The address with its password hidden, for messages. */
export function shownUrl(databaseUrl: string): string {
  const url = new URL(databaseUrl);
  if (url.password) url.password = '***';
  return url.toString();
}

/** Runs a PostgreSQL client program against the database; its error output becomes the message when it fails. */
export async function runPgTool(name: PgTool, args: string[], databaseUrl: string): Promise<string> {
  const binary = await pgTool(name);
  try {
    const { stdout } = await execFileAsync(binary, args, {
      env: libpqEnvironment(databaseUrl),
      maxBuffer: 64 * 1024 * 1024,
    });
    return stdout;
  } catch (error) {
    const stderr = (error as { stderr?: string }).stderr?.trim();
    throw new SetupError(`${name} failed on ${shownUrl(databaseUrl)}:\n${stderr || (error as Error).message}`);
  }
}

/** One SQL statement through psql, its rows as tab-free unaligned text. */
export function psqlQuery(databaseUrl: string, sql: string): Promise<string> {
  return runPgTool('psql', ['-X', '-q', '-v', 'ON_ERROR_STOP=1', '-tA', '-c', sql], databaseUrl).then((out) =>
    out.trim(),
  );
}

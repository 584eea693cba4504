import { execFile } from 'node:child_process';
import { existsSync, mkdirSync, readdirSync, readFileSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { promisify } from 'node:util';
import { databaseName, maintenanceUrl, psqlQuery, runPgTool, shownUrl } from './pg-tools.js';
import { shown } from './paths.js';
import { SetupError } from './setup-error.js';

const execFileAsync = promisify(execFile);

/**
 * One backup is one tar file: `db.dump` (pg_dump's custom format), `manifest.json`, and `files/`, a copy of DATA_DIR
 * (shear photos under files/photos/, the invoice logo under files/logos/). One file, so it can be copied off the
 * machine whole; plain tar, so it opens without Keenroute.
 */
export const BACKUP_FORMAT = 1;
const DUMP = 'db.dump';
const MANIFEST = 'manifest.json';
const FILES = 'files';

export interface BackupManifest {
  format: number;
  createdAt: string;
  database: string;
  serverVersion: string;
  files: number;
}

export interface BackupResult {
  file: string;
  bytes: number;
  dumpBytes: number;
  files: number;
  ms: number;
}

export interface RestoreResult {
  tables: number;
  files: number;
  ms: number;
  /** Where DATA_DIR's earlier contents were moved by --force; undefined when it was empty. */
  setAside?: string;
}

async function tar(args: string[]): Promise<void> {
  try {
    await execFileAsync('tar', args, { maxBuffer: 16 * 1024 * 1024 });
  } catch (error) {
    const stderr = (error as { stderr?: string }).stderr?.trim();
    throw new SetupError(`tar ${args[0]} failed:\n${stderr || (error as Error).message}`);
  }
}

function countFiles(dir: string): number {
  if (!existsSync(dir)) return 0;
  return readdirSync(dir, { recursive: true, withFileTypes: true }).filter((entry) => entry.isFile()).length;
}

/** A file-name-safe stamp in UTC: 2026-12-03T07-30-12Z. */
export function backupStamp(at = new Date()): string {
  return at
    .toISOString()
    .replace(/\.\d{3}Z$/, 'Z')
    .replaceAll(':', '-');
}

/** pg_dump of the whole database (one consistent snapshot) and a copy of DATA_DIR, in one tar file. */
export async function createBackup(options: {
  databaseUrl: string;
  dataDir: string;
  file: string;
}): Promise<BackupResult> {
  const started = performance.now();
  const file = path.resolve(options.file);
  const dataDir = path.resolve(options.dataDir);
  if (existsSync(file)) throw new SetupError(`${shown(file)} already exists: choose another file name.`);
  mkdirSync(path.dirname(file), { recursive: true });
  mkdirSync(dataDir, { recursive: true });
  const staging = `${file}.partial`;
  rmSync(staging, { recursive: true, force: true });
  mkdirSync(staging);
  try {
    const serverVersion = await psqlQuery(options.databaseUrl, 'SHOW server_version');
    await runPgTool(
      'pg_dump',
      ['--format=custom', '--no-owner', '--no-privileges', '--file', path.join(staging, DUMP)],
      options.databaseUrl,
    );
    const files = countFiles(dataDir);
    const manifest: BackupManifest = {
      format: BACKUP_FORMAT,
      createdAt: new Date().toISOString(),
      database: databaseName(options.databaseUrl),
      serverVersion,
      files,
    };
    writeFileSync(path.join(staging, MANIFEST), `${JSON.stringify(manifest, null, 2)}\n`);
    const dumpBytes = statSync(path.join(staging, DUMP)).size;
    // DATA_DIR's own entries come out as ./…; the transform files them under files/ (GNU tar, as on Debian).
    await tar([
      '-cf',
      `${file}.tmp`,
      '-C',
      staging,
      DUMP,
      MANIFEST,
      '-C',
      dataDir,
      `--transform=s,^\\.,${FILES},`,
      '.',
    ]);
    renameSync(`${file}.tmp`, file);
    return { file, bytes: statSync(file).size, dumpBytes, files, ms: performance.now() - started };
  } finally {
    rmSync(staging, { recursive: true, force: true });
    rmSync(`${file}.tmp`, { force: true });
  }
}

function plainDatabaseName(name: string): string {
  if (!/^[A-Za-z_][A-Za-z0-9_-]{0,62}$/.test(name)) {
    throw new SetupError(`Restore only creates databases with plain names (letters, digits, _ and -), not "${name}".`);
  }
  return name;
}

/** Tables, views and sequences outside PostgreSQL's own schemas: any means the database is in use. */
async function userRelations(databaseUrl: string): Promise<number> {
  return Number(
    await psqlQuery(
      databaseUrl,
      `SELECT count(*) FROM pg_class c JOIN pg_namespace n ON n.oid = c.relnamespace
       WHERE c.relkind IN ('r', 'p', 'v', 'm', 'S', 'f')
         AND n.nspname NOT IN ('pg_catalog', 'information_schema') AND n.nspname NOT LIKE 'pg\\_%'`,
    ),
  );
}

async function databaseExists(databaseUrl: string): Promise<boolean> {
  const name = databaseName(databaseUrl).replaceAll("'", "''");
  return (await psqlQuery(maintenanceUrl(databaseUrl), `SELECT 1 FROM pg_database WHERE datname = '${name}'`)) === '1';
}

function readManifest(staging: string, file: string): BackupManifest {
  const manifestPath = path.join(staging, MANIFEST);
  if (!existsSync(manifestPath) || !existsSync(path.join(staging, DUMP))) {
    throw new SetupError(`${shown(file)} is not a Keenroute backup: it holds no ${MANIFEST} and ${DUMP}.`);
  }
  const manifest = JSON.parse(readFileSync(manifestPath, 'utf8')) as BackupManifest;
  if (manifest.format !== BACKUP_FORMAT) {
    throw new SetupError(
      `${shown(file)} is backup format ${manifest.format}; this checkout reads format ${BACKUP_FORMAT}.`,
    );
  }
  return manifest;
}

function isEmptyDir(dir: string): boolean {
  return !existsSync(dir) || readdirSync(dir).length === 0;
}

/**
 * Restores a backup into an empty (or missing) database and an empty DATA_DIR. With `force`, the database is dropped
 * and created empty first (closing its connections) and DATA_DIR's contents are moved aside, not deleted.
 */
export async function restoreBackup(options: {
  file: string;
  databaseUrl: string;
  dataDir: string;
  force: boolean;
}): Promise<RestoreResult & { manifest: BackupManifest }> {
  const started = performance.now();
  const file = path.resolve(options.file);
  const dataDir = path.resolve(options.dataDir);
  const target = shownUrl(options.databaseUrl);
  const name = plainDatabaseName(databaseName(options.databaseUrl));
  if (!existsSync(file)) throw new SetupError(`There is no backup file ${shown(file)}.`);

  const exists = await databaseExists(options.databaseUrl);
  const relations = exists ? await userRelations(options.databaseUrl) : 0;
  if (relations > 0 && !options.force) {
    throw new SetupError(
      `${target} is not empty (${relations} tables, views or sequences): restore only writes into an empty database.\n` +
        `Restore into a new one (DATABASE_URL=…/keenroute_restored npm run restore -- ${shown(file)}), or replace ` +
        `this one and everything in it:  npm run restore -- --force ${shown(file)}`,
    );
  }
  if (!isEmptyDir(dataDir) && !options.force) {
    throw new SetupError(
      `${shown(dataDir)} (DATA_DIR) already holds files: restore only fills an empty folder.\n` +
        `Point DATA_DIR at an empty folder, or add --force to move the present files aside first.`,
    );
  }

  // Unpacked next to DATA_DIR, so the files move into place with one rename on the same disk.
  const staging = `${dataDir}.restoring-${backupStamp()}`;
  mkdirSync(staging, { recursive: true });
  try {
    await tar(['-xf', file, '-C', staging]);
    const manifest = readManifest(staging, file);

    // Past the checks above, a database that exists is either empty or given up by --force.
    const recreate = exists && options.force;
    if (recreate) await psqlQuery(maintenanceUrl(options.databaseUrl), `DROP DATABASE "${name}" WITH (FORCE)`);
    if (!exists || recreate) {
      await psqlQuery(maintenanceUrl(options.databaseUrl), `CREATE DATABASE "${name}"`);
    }
    // One transaction: a restore that fails part-way leaves the database empty, not half filled.
    await runPgTool(
      'pg_restore',
      [
        '--exit-on-error',
        '--single-transaction',
        '--no-owner',
        '--no-privileges',
        '--dbname',
        name,
        path.join(staging, DUMP),
      ],
      options.databaseUrl,
    );

    let setAside: string | undefined;
    if (!isEmptyDir(dataDir)) {
      setAside = `${dataDir}.before-restore-${backupStamp()}`;
      renameSync(dataDir, setAside);
    }
    rmSync(dataDir, { recursive: true, force: true });
    mkdirSync(path.dirname(dataDir), { recursive: true });
    const restoredFiles = path.join(staging, FILES);
    if (existsSync(restoredFiles)) renameSync(restoredFiles, dataDir);
    else mkdirSync(dataDir);

    const tables = Number(
      await psqlQuery(
        options.databaseUrl,
        `SELECT count(*) FROM pg_tables WHERE schemaname NOT IN ('pg_catalog', 'information_schema')`,
      ),
    );
    return { manifest, tables, files: countFiles(dataDir), setAside, ms: performance.now() - started };
  } finally {
    rmSync(staging, { recursive: true, force: true });
  }
}

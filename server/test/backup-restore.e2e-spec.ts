/** `npm run backup` and `npm run restore` end to end: the demo database and a photo out to one file and back. */
import 'reflect-metadata';
import { execFile } from 'node:child_process';
import { randomBytes, randomUUID } from 'node:crypto';
import { existsSync } from 'node:fs';
import { mkdir, mkdtemp, readdir, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { promisify } from 'node:util';
import { DataSource } from 'typeorm';
import { seedDemo } from '../src/database/seeds/seed-demo';
import { typeormOptions } from '../src/database/typeorm-options';
import { photoPaths } from '../src/shears/shear-photos.service';

const execFileAsync = promisify(execFile);
const repoRoot = resolve(__dirname, '..', '..');
const tsx = join(repoRoot, 'node_modules', '.bin', 'tsx');

interface TableFingerprint {
  table: string;
  rows: number;
  md5: string;
}

function urlFor(database: string): string {
  const url = new URL(process.env.DATABASE_URL!);
  url.pathname = `/${database}`;
  return url.toString();
}

/** Every table outside PostgreSQL's own schemas: its row count and an md5 over its rows' text in a fixed order. */
async function fingerprint(db: DataSource): Promise<TableFingerprint[]> {
  const tables = await db.query<{ name: string }[]>(
    `SELECT format('%I.%I', schemaname, tablename) AS name FROM pg_tables
     WHERE schemaname NOT IN ('pg_catalog', 'information_schema') ORDER BY 1`,
  );
  const result: TableFingerprint[] = [];
  for (const { name } of tables) {
    const [row] = await db.query<{ rows: string; md5: string }[]>(
      `SELECT count(*) AS rows, md5(coalesce(string_agg(t::text, E'\\n' ORDER BY t::text), '')) AS md5 FROM ${name} t`,
    );
    result.push({ table: name, rows: Number(row!.rows), md5: row!.md5 });
  }
  return result;
}

/** Where each sequence stands: invoice numbers and shear tags must carry on from the same value after a restore. */
const sequences = (db: DataSource) =>
  db.query<{ name: string; last_value: string | null }[]>(
    `SELECT schemaname || '.' || sequencename AS name, last_value FROM pg_sequences ORDER BY 1`,
  );

async function runScript(script: 'backup' | 'restore', args: string[], env: { database: string; dataDir: string }) {
  try {
    const { stdout } = await execFileAsync(tsx, [join('scripts', `${script}.ts`), ...args], {
      cwd: repoRoot,
      env: { ...process.env, DATABASE_URL: urlFor(env.database), DATA_DIR: env.dataDir },
    });
    return { code: 0, output: stdout };
  } catch (error) {
    const failed = error as { code?: number; stdout?: string; stderr?: string };
    return { code: failed.code ?? 1, output: `${failed.stdout ?? ''}${failed.stderr ?? ''}` };
  }
}

describe('backup and restore (e2e)', () => {
  const suffix = randomBytes(4).toString('hex');
  const source = `backup_src_${suffix}`;
  const target = `backup_dst_${suffix}`;
  let admin: DataSource;
  let sourceDb: DataSource;
  let work: string;
  let sourceData: string;
  let targetData: string;
  let archive: string;
  let photoFile: string;
  let photoBytes: Buffer;
  let before: TableFingerprint[];
  let backupOutput: string;

  beforeAll(async () => {
    admin = await new DataSource({ type: 'postgres', url: process.env.DATABASE_URL }).initialize();
    await admin.query(`CREATE DATABASE "${source}"`);
    sourceDb = await new DataSource(typeormOptions(urlFor(source))).initialize();
    await sourceDb.runMigrations({ transaction: 'each' });
    await seedDemo(sourceDb);

    work = await mkdtemp(join(tmpdir(), 'kr-backup-'));
    sourceData = join(work, 'source-data');
    targetData = join(work, 'target-data');
    const [shear] = await sourceDb.query<{ id: string }[]>(`SELECT id FROM shears ORDER BY created_at, id LIMIT 1`);
    const photoId = randomUUID();
    const paths = photoPaths(join(sourceData, 'photos'), shear!.id, photoId, 'image/jpeg');
    photoBytes = randomBytes(64 * 1024);
    await mkdir(paths.folder, { recursive: true });
    await writeFile(paths.original, photoBytes);
    await writeFile(paths.thumbnail, randomBytes(2048));
    await sourceDb.query(
      `INSERT INTO shear_photos (id, shear_id, content_type, byte_size, width, height) VALUES ($1, $2, 'image/jpeg', $3, 640, 480)`,
      [photoId, shear!.id, photoBytes.length],
    );
    photoFile = paths.original.slice(sourceData.length + 1);
    before = await fingerprint(sourceDb);

    archive = join(work, 'keenroute.tar');
    const backup = await runScript('backup', [archive], { database: source, dataDir: sourceData });
    expect(backup).toMatchObject({ code: 0 });
    backupOutput = backup.output;
  }, 90_000);

  afterAll(async () => {
    await sourceDb?.destroy();
    await admin?.query(`DROP DATABASE IF EXISTS "${source}" WITH (FORCE)`);
    await admin?.query(`DROP DATABASE IF EXISTS "${target}" WITH (FORCE)`);
    await admin?.destroy();
    if (work) await rm(work, { recursive: true, force: true });
  });

  it('writes one tar file with the dump, a manifest and DATA_DIR, and says how to restore it', async () => {
    expect(backupOutput).toMatch(
      /Backup written: .*keenroute\.tar +\([\d.]+ [KM]iB: database dump [\d.]+ [KM]iB, 2 files from DATA_DIR/,
    );
    expect(backupOutput).toContain(`npm run restore -- `);
    const { stdout } = await execFileAsync('tar', ['-tf', archive]);
    expect(stdout.split('\n')).toEqual(expect.arrayContaining(['db.dump', 'manifest.json', `files/${photoFile}`]));
  });

  it('restores into a database not yet created: every row of every table, every sequence and the photo bytes', async () => {
    const restored = await runScript('restore', [archive], { database: target, dataDir: targetData });
    expect(restored).toMatchObject({ code: 0 });
    expect(restored.output).toMatch(new RegExp(`Restored the backup of ${source} taken .*: ${before.length} tables`));

    const targetDb = await new DataSource({ type: 'postgres', url: urlFor(target) }).initialize();
    try {
      const after = await fingerprint(targetDb);
      expect(before.filter((table) => table.rows > 0).length).toBeGreaterThan(10);
      expect(after).toEqual(before);
      expect(await sequences(targetDb)).toEqual(await sequences(sourceDb));
      const [migrations] = await targetDb.query<{ n: string }[]>(`SELECT count(*) AS n FROM migrations`);
      expect(Number(migrations!.n)).toBe(sourceDb.migrations.length);
    } finally {
      await targetDb.destroy();
    }
    expect((await readFile(join(targetData, photoFile))).equals(photoBytes)).toBe(true);
  });

  it('refuses a database that has tables and a DATA_DIR that has files, and changes neither', async () => {
    const intoSource = await runScript('restore', [archive], { database: source, dataDir: join(work, 'empty') });
    expect(intoSource.code).toBe(1);
    expect(intoSource.output).toMatch(/is not empty \(\d+ tables, views or sequences\).*--force/s);

    const emptyDb = `backup_empty_${suffix}`;
    await admin.query(`CREATE DATABASE "${emptyDb}"`);
    try {
      const intoFiles = await runScript('restore', [archive], { database: emptyDb, dataDir: sourceData });
      expect(intoFiles.code).toBe(1);
      expect(intoFiles.output).toMatch(/DATA_DIR\) already holds files/);
      const [kept] = await admin.query<{ n: string }[]>(`SELECT count(*) AS n FROM pg_database WHERE datname = $1`, [
        emptyDb,
      ]);
      expect(Number(kept!.n)).toBe(1);
    } finally {
      await admin.query(`DROP DATABASE IF EXISTS "${emptyDb}" WITH (FORCE)`);
    }
    expect(await fingerprint(sourceDb)).toEqual(before);
  });

  it('with --force, replaces a database in use and moves the files DATA_DIR held aside', async () => {
    const targetDb = await new DataSource({ type: 'postgres', url: urlFor(target) }).initialize();
    await targetDb.query(`DELETE FROM shear_photos`);
    await targetDb.destroy();
    await writeFile(join(targetData, 'stray.txt'), 'written after the restore');

    const forced = await runScript('restore', ['--force', archive], { database: target, dataDir: targetData });
    expect(forced).toMatchObject({ code: 0 });
    expect(forced.output).toMatch(/The files DATA_DIR held before are in .*target-data\.before-restore-/);

    const again = await new DataSource({ type: 'postgres', url: urlFor(target) }).initialize();
    try {
      expect(await fingerprint(again)).toEqual(before);
    } finally {
      await again.destroy();
    }
    expect(existsSync(join(targetData, 'stray.txt'))).toBe(false);
    const setAside = (await readdir(work)).find((name) => name.startsWith('target-data.before-restore-'));
    expect(await readFile(join(work, setAside!, 'stray.txt'), 'utf8')).toBe('written after the restore');
  });
});

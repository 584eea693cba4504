import { execFile } from 'node:child_process';
import { chownSync, existsSync, mkdirSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { freePort } from '../instances/api-instances';

const run = promisify(execFile);
const isRoot = process.getuid?.() === 0;

/** Debian's PostgreSQL programs (what scripts/lib/postgres-binaries.ts finds for npm test), newest major first. */
function binDir(): string {
  const root = '/usr/lib/postgresql';
  const majors = existsSync(root) ? readdirSync(root).sort((a, b) => Number(b) - Number(a)) : [];
  const found = majors.map((major) => join(root, major, 'bin')).find((dir) => existsSync(join(dir, 'pg_ctl')));
  if (!found) throw new Error('No PostgreSQL programs under /usr/lib/postgresql/*/bin (apt-get install postgresql).');
  return found;
}

export interface PrivatePostgres {
  port: number;
  url(database: string): string;
  stop(): Promise<void>;
  start(): Promise<void>;
  /** Stops the server for good and deletes its folder. */
  remove(): Promise<void>;
}

/**
 * A throwaway PostgreSQL cluster of one test's own, on 127.0.0.1 and a free port, that the test may stop and start:
 * the same steps scripts/lib/postgres.ts takes for npm test (initdb and pg_ctl as the postgres user when we are root),
 * written again here because scripts/ is ESM and the e2e tests run under jest as CommonJS.
 */
export async function startPrivatePostgres(): Promise<PrivatePostgres> {
  const bin = binDir();
  const folder = mkdtempSync(join(tmpdir(), 'kr-faults-pg-'));
  const dataDir = join(folder, 'data');
  const socketDir = join(folder, 'socket');
  mkdirSync(dataDir, { mode: 0o700 });
  mkdirSync(socketDir);
  if (isRoot) {
    const uid = Number((await run('id', ['-u', 'postgres'])).stdout.trim());
    const gid = Number((await run('id', ['-g', 'postgres'])).stdout.trim());
    for (const dir of [folder, dataDir, socketDir]) chownSync(dir, uid, gid);
  }
  const asPostgres = (program: string, args: string[]) =>
    isRoot ? run('runuser', ['-u', 'postgres', '--', join(bin, program), ...args]) : run(join(bin, program), args);
  await asPostgres('initdb', ['-D', dataDir, '-U', 'postgres', '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8']);
  const port = await freePort();
  const settings = [
    '-c listen_addresses=127.0.0.1',
    `-c port=${port}`,
    `-c unix_socket_directories=${socketDir}`,
    // Durable commits: the test checks that what was acknowledged survives the restart.
    '-c fsync=on',
  ].join(' ');
  const log = join(folder, 'postgres.log');
  const cluster: PrivatePostgres = {
    port,
    url: (database) => `postgres://postgres@127.0.0.1:${port}/${database}`,
    start: async () => {
      await asPostgres('pg_ctl', ['-D', dataDir, '-l', log, '-w', '-t', '60', '-o', settings, 'start']);
    },
    stop: async () => {
      await asPostgres('pg_ctl', ['-D', dataDir, '-m', 'fast', '-w', '-t', '60', 'stop']);
    },
    remove: async () => {
      if (existsSync(join(dataDir, 'postmaster.pid'))) await cluster.stop().catch(() => undefined);
      rmSync(folder, { recursive: true, force: true });
    },
  };
  await cluster.start();
  return cluster;
}

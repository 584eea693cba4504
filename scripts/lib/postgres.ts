import { execFile, execFileSync, spawnSync } from 'node:child_process';
import {
  chownSync,
  chmodSync,
  closeSync,
  existsSync,
  mkdirSync,
  openSync,
  readdirSync,
  readFileSync,
  rmSync,
  unlinkSync,
} from 'node:fs';
import path from 'node:path';
import { promisify } from 'node:util';
import { ensurePostgres, findPostgresBinaries, type PostgresBinaries } from './postgres-binaries.js';
import { shown } from './paths.js';
import { assertPortFree, mustRun } from './processes.js';
import { SetupError } from './setup-error.js';

export { ensurePostgres } from './postgres-binaries.js';

const execFileAsync = promisify(execFile);
const isRoot = process.getuid?.() === 0;

export interface ClusterOptions {
  dataDir: string;
  port: number;
  logFile: string;
  /** How to choose another port, shown when `port` is taken. */
  portHint?: string;
  /** When a server from an earlier run is still up: 'take-over' stops it at the end, 'share' leaves it running. */
  alreadyRunning?: 'take-over' | 'share';
  /** false for throwaway test clusters: no fsync, faster on small machines. */
  durable?: boolean;
}

export interface Cluster {
  readonly port: number;
  readonly host: '127.0.0.1';
  readonly socketDir: string;
  readonly dataDir: string;
  /** False when an already running server was shared; stop() then leaves it alone. */
  readonly startedHere: boolean;
  url(dbName: string): string;
  stop(): Promise<void>;
  /** Synchronous stop for a process that is exiting and cannot wait for promises. */
  stopNow(): void;
  psql(sql: string, dbName?: string): Promise<string>;
}

interface Postmaster {
  pid: number;
  port: number;
}

/** Runs PostgreSQL's programs as the postgres user when we are root: initdb refuses to run as root. */
function asPostgres(binary: string, args: string[]): [string, string[]] {
  return isRoot ? ['runuser', ['-u', 'postgres', '--', binary, ...args]] : [binary, args];
}

function postgresUser(): { uid: number; gid: number } {
  try {
    const uid = Number(execFileSync('id', ['-u', 'postgres'], { encoding: 'utf8' }).trim());
    const gid = Number(execFileSync('id', ['-g', 'postgres'], { encoding: 'utf8' }).trim());
    return { uid, gid };
  } catch {
    throw new SetupError(
      'There is no `postgres` system user (Debian creates it with postgresql-common).\n' +
        'Fix it with:  apt-get install --reinstall -y postgresql-common',
    );
  }
}

/** Folders PostgreSQL writes to must belong to the postgres user, the data folder private to it. */
function ownForPostgres(target: string, mode?: number): void {
  if (mode !== undefined) chmodSync(target, mode);
  if (!isRoot) return;
  const { uid, gid } = postgresUser();
  chownSync(target, uid, gid);
}

function processIsPostgres(pid: number): boolean {
  try {
    process.kill(pid, 0);
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== 'EPERM') return false;
  }
  if (!existsSync('/proc/self')) return true;
  try {
    return readFileSync(`/proc/${pid}/cmdline`, 'utf8').includes('postgres');
  } catch {
    return false;
  }
}

/** The server recorded in postmaster.pid, if it is really still running; a stale file is removed with a note. */
function runningPostmaster(dataDir: string): Postmaster | undefined {
  const pidFile = path.join(dataDir, 'postmaster.pid');
  if (!existsSync(pidFile)) return undefined;
  const [pidLine, , , portLine] = readFileSync(pidFile, 'utf8').split('\n');
  const pid = Number(pidLine);
  const port = Number(portLine);
  if (Number.isInteger(pid) && pid > 0 && processIsPostgres(pid)) return { pid, port };
  console.log(
    `Found a stale ${shown(pidFile)}: PostgreSQL was not shut down cleanly last time and process ${pidLine} is gone.\n` +
      'Removing the stale file and starting PostgreSQL normally (it recovers from its own journal).',
  );
  unlinkSync(pidFile);
  return undefined;
}

function dataMajor(dataDir: string): number | undefined {
  const versionFile = path.join(dataDir, 'PG_VERSION');
  return existsSync(versionFile) ? Number(readFileSync(versionFile, 'utf8').trim()) : undefined;
}

function logTail(logFile: string, lines = 25): string {
  try {
    return readFileSync(logFile, 'utf8').trimEnd().split('\n').slice(-lines).join('\n');
  } catch {
    return '(no log written)';
  }
}

async function initCluster(bins: PostgresBinaries, dataDir: string): Promise<void> {
  console.log(`Creating a private PostgreSQL ${bins.major} cluster in ${shown(dataDir)}…`);
  const [command, args] = asPostgres(bins.bin('initdb'), [
    '-D',
    dataDir,
    '-U',
    'postgres',
    '--auth=trust',
    '-E',
    'UTF8',
    '--locale=C.UTF-8',
    '--no-instructions',
  ]);
  await mustRun('initdb', command, args, `initdb could not create the cluster in ${dataDir}: read its message above.`);
}

/** Checks the data folder is a cluster these binaries can run (or empty), creating it when empty. */
async function prepareDataDir(dataDir: string, socketDir: string, logFile: string): Promise<PostgresBinaries> {
  const existingMajor = dataMajor(dataDir);
  const bins = await ensurePostgres(existingMajor);
  mkdirSync(dataDir, { recursive: true });
  ownForPostgres(dataDir, 0o700);
  if (existingMajor === undefined) {
    if (readdirSync(dataDir).length > 0) {
      throw new SetupError(
        `${shown(dataDir)} is not empty but holds no PostgreSQL cluster (no PG_VERSION).\n` +
          `Move it aside, or delete it if it holds nothing you need:  rm -rf ${dataDir}`,
      );
    }
    await initCluster(bins, dataDir);
  } else if (existingMajor !== bins.major) {
    throw new SetupError(
      `${shown(dataDir)} was created by PostgreSQL ${existingMajor}, but this machine has PostgreSQL ${bins.major}.\n` +
        `Install version ${existingMajor} (apt-get install -y postgresql-${existingMajor}), or start over without ` +
        `the data in it:  rm -rf ${dataDir}`,
    );
  }
  mkdirSync(socketDir, { recursive: true });
  ownForPostgres(socketDir, 0o700);
  mkdirSync(path.dirname(logFile), { recursive: true });
  closeSync(openSync(logFile, 'a'));
  ownForPostgres(logFile, 0o600);
  return bins;
}

/** Starts (creating if needed) a PostgreSQL cluster on 127.0.0.1 only, with its socket inside the data folder. */
export async function startCluster(options: ClusterOptions): Promise<Cluster> {
  const dataDir = path.resolve(options.dataDir);
  const socketDir = path.join(dataDir, 'socket');
  const logFile = path.resolve(options.logFile);
  if (socketDir.includes("'") || `${socketDir}/.s.PGSQL.${options.port}`.length > 100) {
    throw new SetupError(`The data folder path is too long or has a quote in it: move the checkout to a plainer path.`);
  }
  const bins = await prepareDataDir(dataDir, socketDir, logFile);
  const pgCtl = bins.bin('pg_ctl');

  const earlier = runningPostmaster(dataDir);
  if (earlier) {
    const share = options.alreadyRunning === 'share';
    console.log(
      `PostgreSQL from an earlier run is still running on ${shown(dataDir)} (pid ${earlier.pid}, port ${earlier.port}): ` +
        (share ? 'using it and leaving it running.' : 'using it, and it stops with this command.'),
    );
    return makeCluster(bins, dataDir, socketDir, earlier.port, !share);
  }

  await assertPortFree(options.port, 'PostgreSQL', options.portHint ?? 'choose another port for it');
  const settings = [
    `-c listen_addresses=127.0.0.1`,
    `-c port=${options.port}`,
    `-c unix_socket_directories='${socketDir}'`,
    ...(options.durable === false ? ['-c fsync=off', '-c synchronous_commit=off', '-c full_page_writes=off'] : []),
  ].join(' ');
  const [command, args] = asPostgres(pgCtl, ['-D', dataDir, '-l', logFile, '-w', '-t', '60', '-o', settings, 'start']);
  try {
    await mustRun('postgres', command, args, '');
  } catch {
    throw new SetupError(
      `PostgreSQL did not start. The end of its log (${shown(logFile)}):\n${logTail(logFile)}\n\n` +
        `Fix what the log names. If the cluster is damaged and holds nothing you need, start over:  rm -rf ${dataDir}`,
    );
  }
  console.log(`PostgreSQL ${bins.major} is listening on 127.0.0.1:${options.port} (data in ${shown(dataDir)}).`);
  return makeCluster(bins, dataDir, socketDir, options.port, true);
}

function makeCluster(
  bins: PostgresBinaries,
  dataDir: string,
  socketDir: string,
  port: number,
  startedHere: boolean,
): Cluster {
  const stopArgs = (mode: 'fast' | 'immediate') =>
    asPostgres(bins.bin('pg_ctl'), ['-D', dataDir, '-m', mode, '-w', '-t', '60', 'stop']);
  let stopping: Promise<void> | undefined;
  const cluster: Cluster = {
    port,
    host: '127.0.0.1',
    socketDir,
    dataDir,
    startedHere,
    url: (dbName) => `postgres://postgres@127.0.0.1:${port}/${dbName}`,
    stop() {
      if (!startedHere) return Promise.resolve();
      stopping ??= (async () => {
        if (!existsSync(path.join(dataDir, 'postmaster.pid'))) return;
        const [command, args] = stopArgs('fast');
        await mustRun('postgres', command, args, `Stop it by hand:  ${[command, ...args].join(' ')}`);
      })();
      return stopping;
    },
    stopNow() {
      if (!startedHere || !existsSync(path.join(dataDir, 'postmaster.pid'))) return;
      const [command, args] = stopArgs('fast');
      spawnSync(command, args, { stdio: 'ignore', timeout: 30_000 });
    },
    async psql(sql, dbName = 'postgres') {
      const { stdout } = await execFileAsync(
        bins.bin('psql'),
        [
          '-X',
          '-q',
          '-v',
          'ON_ERROR_STOP=1',
          '-h',
          '127.0.0.1',
          '-p',
          String(port),
          '-U',
          'postgres',
          '-d',
          dbName,
          '-tA',
          '-c',
          sql,
        ],
        { env: { ...process.env, PGCONNECT_TIMEOUT: '10' } },
      ).catch((error: Error & { stderr?: string }) => {
        throw new SetupError(`psql on port ${port} failed for \`${sql}\`:\n${error.stderr?.trim() || error.message}`);
      });
      return stdout.trim();
    },
  };
  return cluster;
}

function checkedName(name: string): string {
  if (!/^[a-z_][a-z0-9_]{0,62}$/.test(name)) throw new Error(`Not a plain database name: ${name}`);
  return name;
}

/** Creates the database unless it exists. */
export async function ensureDatabase(cluster: Cluster, name: string): Promise<void> {
  const db = checkedName(name);
  const exists = await cluster.psql(`SELECT 1 FROM pg_database WHERE datname = '${db}'`);
  if (exists !== '1') {
    await cluster.psql(`CREATE DATABASE "${db}"`);
    console.log(`Created database ${db}.`);
  }
}

/** Drops the database if it exists, closing any connections to it first. */
export async function dropDatabase(cluster: Cluster, name: string): Promise<void> {
  await cluster.psql(`DROP DATABASE IF EXISTS "${checkedName(name)}" WITH (FORCE)`);
}

/** Stops whatever server still runs on a throwaway cluster, then deletes its folder. */
export async function discardCluster(dataDir: string): Promise<void> {
  const earlier = existsSync(dataDir) ? runningPostmaster(dataDir) : undefined;
  if (earlier) {
    const bins = findPostgresBinaries(dataMajor(dataDir));
    if (bins) {
      console.log(`Stopping a PostgreSQL left running on ${shown(dataDir)} (pid ${earlier.pid}) by an earlier run…`);
      const [command, args] = asPostgres(bins.bin('pg_ctl'), [
        '-D',
        dataDir,
        '-m',
        'immediate',
        '-w',
        '-t',
        '30',
        'stop',
      ]);
      await mustRun('postgres', command, args, `Stop it by hand (kill ${earlier.pid}), then run the command again.`);
    }
  }
  rmSync(dataDir, { recursive: true, force: true });
}

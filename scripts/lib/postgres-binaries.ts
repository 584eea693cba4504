import { execFileSync } from 'node:child_process';
import { existsSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { aptInstall } from './apt.js';
import { SetupError } from './setup-error.js';

export interface PostgresBinaries {
  binDir: string;
  major: number;
  bin(name: 'initdb' | 'pg_ctl' | 'postgres' | 'psql'): string;
}

function quiet(command: string, args: string[]): string | undefined {
  try {
    return execFileSync(command, args, { encoding: 'utf8', stdio: ['ignore', 'pipe', 'ignore'] }).trim();
  } catch {
    return undefined;
  }
}

function inspect(binDir: string): PostgresBinaries | undefined {
  const needed = ['initdb', 'pg_ctl', 'postgres'];
  if (!needed.every((name) => existsSync(path.join(binDir, name)))) return undefined;
  // "postgres (PostgreSQL) 15.18 (Debian 15.18-0+deb12u1)"
  const major = Number(/\(PostgreSQL\)\s+(\d+)/.exec(quiet(path.join(binDir, 'postgres'), ['--version']) ?? '')?.[1]);
  if (!Number.isInteger(major)) return undefined;
  const psqlHere = path.join(binDir, 'psql');
  return {
    binDir,
    major,
    bin: (name) => (name === 'psql' && !existsSync(psqlHere) ? 'psql' : path.join(binDir, name)),
  };
}

/** Server binaries from `pg_config --bindir`, then /usr/lib/postgresql/<major>/bin (newest first). */
export function findPostgresBinaries(preferMajor?: number): PostgresBinaries | undefined {
  const found: PostgresBinaries[] = [];
  const fromPgConfig = quiet('pg_config', ['--bindir']);
  const pgConfigBins = fromPgConfig ? inspect(fromPgConfig) : undefined;
  if (pgConfigBins) found.push(pgConfigBins);
  const debianRoot = '/usr/lib/postgresql';
  if (existsSync(debianRoot)) {
    const majors = readdirSync(debianRoot)
      .filter((entry) => /^\d+$/.test(entry))
      .sort((a, b) => Number(b) - Number(a));
    for (const major of majors) {
      const bins = inspect(path.join(debianRoot, major, 'bin'));
      if (bins) found.push(bins);
    }
  }
  return found.find((bins) => bins.major === preferMajor) ?? found[0];
}

/** The server binaries, installing Debian's `postgresql` package when they are missing. */
export async function ensurePostgres(preferMajor?: number): Promise<PostgresBinaries> {
  const present = findPostgresBinaries(preferMajor);
  if (present) return present;
  await aptInstall(
    ['postgresql'],
    "PostgreSQL's server programs (initdb, pg_ctl, postgres) are not installed; Keenroute runs its own private PostgreSQL.",
  );
  const installed = findPostgresBinaries(preferMajor);
  if (!installed) {
    throw new SetupError(
      'apt-get finished but initdb and postgres are still missing from `pg_config --bindir` and /usr/lib/postgresql/*/bin.\n' +
        'Check with:  dpkg -L postgresql-15 | grep bin/initdb   (or the version apt installed)',
    );
  }
  return installed;
}

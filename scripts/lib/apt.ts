import { accessSync, constants } from 'node:fs';
import path from 'node:path';
import { mustRun } from './processes.js';
import { SetupError } from './setup-error.js';

/** The first executable called `name` on PATH, if any. */
export function findOnPath(name: string): string | undefined {
  for (const dir of (process.env.PATH ?? '').split(path.delimiter)) {
    if (!dir) continue;
    const candidate = path.join(dir, name);
    try {
      accessSync(candidate, constants.X_OK);
      return candidate;
    } catch {
      // Not here; keep looking.
    }
  }
  return undefined;
}

/**
 * Installs Debian packages with apt-get, saying why first. Where that cannot work (no apt-get, not root) it stops
 * with the command to run by hand.
 */
export async function aptInstall(packages: readonly string[], why: string): Promise<void> {
  const manual = `apt-get install -y --no-install-recommends ${packages.join(' ')}`;
  if (!findOnPath('apt-get')) {
    throw new SetupError(
      `${why}\nThis machine has no apt-get, so it cannot be installed automatically.\n` +
        `Install the equivalent of Debian's ${packages.join(', ')} with your system's package manager, then run the command again.`,
    );
  }
  if (process.getuid?.() !== 0) {
    throw new SetupError(`${why}\nInstalling it needs root. Run:  sudo ${manual}\nthen run the command again.`);
  }
  console.log(`${why}\nInstalling Debian's ${packages.join(', ')} with apt-get (one time only; this takes a minute)…`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  await mustRun(
    'apt-get',
    'apt-get',
    ['update', '-q'],
    "apt-get could not read Debian's package lists: check this machine can reach its Debian mirror, then try again.",
    { env },
  );
  await mustRun(
    'apt-get',
    'apt-get',
    ['install', '-y', '-q', '--no-install-recommends', ...packages],
    `Installing ${packages.join(', ')} failed: read apt-get's message above ` +
      `(another apt-get running holds its lock? then wait and retry), or install by hand:  ${manual}`,
    { env },
  );
}

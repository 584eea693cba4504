// Plain JavaScript on purpose: this runs before `npm ci`, when neither tsx nor TypeScript may be installed yet.
// It installs the npm dependencies when node_modules is missing or stale against package-lock.json, and does nothing else.
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const lockfile = path.join(root, 'package-lock.json');
const modules = path.join(root, 'node_modules');
const stamp = path.join(modules, '.keenroute-lockfile-sha256');

function fail(message) {
  console.error(`\n${message}`);
  process.exit(1);
}

function checkNode() {
  const [major, minor] = process.versions.node.split('.').map(Number);
  if ((major === 20 && minor >= 19) || major >= 22) return;
  fail(
    `Keenroute needs Node.js 20.19 or newer (20.x or 22+); this is ${process.version}. Install a newer Node.js, then run the command again.`,
  );
}

function readJson(file) {
  try {
    return JSON.parse(readFileSync(file, 'utf8'));
  } catch {
    return undefined;
  }
}

// npm's own record of what it installed (node_modules/.package-lock.json) matching the lockfile also counts as fresh,
// so a checkout installed by hand is not reinstalled just because it has no stamp yet.
function installedMatchesLockfile() {
  const wanted = readJson(lockfile)?.packages;
  const installed = readJson(path.join(modules, '.package-lock.json'))?.packages;
  if (!wanted || !installed) return false;
  const same = (key) => JSON.stringify(wanted[key]) === JSON.stringify(installed[key]);
  const everyInstalledIsWanted = Object.keys(installed).every(same);
  // Optional packages for other platforms are never installed.
  const everyWantedIsInstalled = Object.keys(wanted).every(
    (key) => key === '' || wanted[key].optional || key in installed,
  );
  return everyInstalledIsWanted && everyWantedIsInstalled;
}

function main() {
  checkNode();
  if (!existsSync(lockfile))
    fail('package-lock.json is missing: restore it from git (git checkout -- package-lock.json).');
  const hash = createHash('sha256').update(readFileSync(lockfile)).digest('hex');
  if (existsSync(modules)) {
    if (existsSync(stamp) && readFileSync(stamp, 'utf8').trim() === hash) return;
    if (installedMatchesLockfile()) {
      writeFileSync(stamp, `${hash}\n`);
      return;
    }
    console.log('node_modules is out of date with package-lock.json: reinstalling with `npm ci` (about a minute)…');
  } else {
    console.log('Installing the npm dependencies with `npm ci` (one time; about a minute)…');
  }
  const result = spawnSync('npm', ['ci', '--no-audit', '--no-fund'], { cwd: root, stdio: 'inherit' });
  if (result.error)
    fail(`Could not run npm (${result.error.message}): install Node.js with npm 10 or newer, then try again.`);
  if (result.status !== 0) {
    fail(
      `npm ci failed (exit ${result.status ?? result.signal}). Read npm's message above. Usual fixes:\n` +
        '  - check this machine can reach the npm registry (npm ping);\n' +
        '  - if package.json and package-lock.json disagree, the lockfile needs updating by whoever changed package.json;\n' +
        '  - remove a half-finished install and try again:  rm -rf node_modules && npm start',
    );
  }
  mkdirSync(modules, { recursive: true });
  writeFileSync(stamp, `${hash}\n`);
}

main();

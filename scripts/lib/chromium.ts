import { accessSync, constants } from 'node:fs';
import { aptInstall } from './apt.js';
import { SetupError } from './setup-error.js';

const chromiumPath = '/usr/bin/chromium';

function isExecutable(file: string): boolean {
  try {
    accessSync(file, constants.X_OK);
    return true;
  } catch {
    return false;
  }
}

/** Debian's Chromium for the browser tests, installed with apt-get when missing (never a browser download). */
export async function ensureChromium(): Promise<string> {
  if (isExecutable(chromiumPath)) return chromiumPath;
  await aptInstall(['chromium'], `The browser tests drive Debian's Chromium, and ${chromiumPath} is missing.`);
  if (!isExecutable(chromiumPath)) {
    throw new SetupError(
      `apt-get installed chromium but ${chromiumPath} is still missing: check with  dpkg -L chromium`,
    );
  }
  return chromiumPath;
}

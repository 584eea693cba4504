import { randomBytes } from 'node:crypto';
import { chmodSync, existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { paths, shown } from './paths.js';
import { SetupError } from './setup-error.js';

interface Secrets {
  jwtSecret: string;
}

/** The development JWT secret: made once, kept private in .data/secrets.json so sign-ins survive a restart. */
export function developmentJwtSecret(file = paths.secrets): string {
  if (existsSync(file)) {
    let secrets: Partial<Secrets>;
    try {
      secrets = JSON.parse(readFileSync(file, 'utf8')) as Partial<Secrets>;
    } catch {
      secrets = {};
    }
    if (typeof secrets.jwtSecret === 'string' && secrets.jwtSecret.length >= 32) {
      chmodSync(file, 0o600);
      return secrets.jwtSecret;
    }
    throw new SetupError(
      `${shown(file)} holds no usable jwtSecret. Delete it and a new one is made at the next start ` +
        `(everyone signed in is signed out):  rm ${file}`,
    );
  }
  const secrets: Secrets = { jwtSecret: randomBytes(48).toString('base64url') };
  mkdirSync(path.dirname(file), { recursive: true });
  writeFileSync(file, `${JSON.stringify(secrets, null, 2)}\n`, { mode: 0o600 });
  chmodSync(file, 0o600);
  console.log(`Made a private JWT secret in ${shown(file)} (mode 600).`);
  return secrets.jwtSecret;
}

/** A secret for one test run only. */
export function throwawayJwtSecret(): string {
  return randomBytes(48).toString('base64url');
}

/** A payment webhook signing secret for one run: the stand-in signs with it and the app verifies with it. */
export function throwawayWebhookSecret(): string {
  // Hex, because the app accepts only whsec_ followed by letters, digits and _.
  return `whsec_${randomBytes(24).toString('hex')}`;
}

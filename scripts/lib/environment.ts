import { mkdirSync } from 'node:fs';
import { paths } from './paths.js';
import { SetupError } from './setup-error.js';

export interface AppSettings {
  mode: 'development' | 'test';
  port: number;
  databaseUrl: string;
  jwtSecret: string;
  smtpPort: number;
  mailCatcherUrl: string;
  /** The geocoder stand-in (or a real geocoder of the same search form). */
  geocoderUrl: string;
  /** A routing service of the `table` form; unset: great-circle estimates. */
  routingUrl?: string;
  /** The payment stand-in (or unset: the real payment service) and the webhook signing secret it signs with. */
  stripeApiUrl?: string;
  stripeWebhookSecret?: string;
  dataDir: string;
}

/** The environment the API, its migrations, its seed and its e2e tests read (server/src/config/environment.ts). */
export function appEnvironment(settings: AppSettings): NodeJS.ProcessEnv {
  mkdirSync(settings.dataDir, { recursive: true });
  return {
    ...process.env,
    NODE_ENV: settings.mode,
    HOST: '127.0.0.1',
    PORT: String(settings.port),
    DATABASE_URL: settings.databaseUrl,
    JWT_SECRET: settings.jwtSecret,
    APP_URL: appOrigin(settings.port),
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(settings.smtpPort),
    MAIL_FROM: 'Keenroute (demo) <no-reply@demo.keenroute.test>',
    MAIL_CATCHER_URL: settings.mailCatcherUrl,
    GEOCODER_URL: settings.geocoderUrl,
    ...(settings.routingUrl ? { ROUTING_URL: settings.routingUrl } : {}),
    ...(settings.stripeApiUrl ? { STRIPE_API_URL: settings.stripeApiUrl } : {}),
    ...(settings.stripeWebhookSecret ? { STRIPE_WEBHOOK_SECRET: settings.stripeWebhookSecret } : {}),
    CLIENT_DIST: paths.clientDist,
    DATA_DIR: settings.dataDir,
    // Tests refuse requests on purpose by the hundred; only real failures (5xx) belong in their output.
    LOG_LEVEL: settings.mode === 'test' ? 'error' : 'info',
  };
}

export function appOrigin(port: number): string {
  return `http://127.0.0.1:${port}`;
}

/** A port from the environment, or the default; anything else stops with the variable's name. */
export function portFromEnv(name: string, fallback: number): number {
  const raw = process.env[name];
  if (raw === undefined || raw === '') return fallback;
  const port = Number(raw);
  if (!Number.isInteger(port) || port < 1 || port > 65535) {
    throw new SetupError(
      `${name}=${raw} is not a port number (1-65535). Unset it or give a number, e.g. ${name}=${fallback + 1}`,
    );
  }
  return port;
}

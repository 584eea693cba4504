import { plainToInstance, Transform } from 'class-transformer';
import { IsIn, IsInt, IsOptional, IsString, IsUrl, Matches, Max, Min, MinLength, validateSync } from 'class-validator';
import { isIP } from 'node:net';

/** The environment the API reads, with the safe local defaults `npm start` relies on. */
export class Environment {
  @IsIn(['development', 'test', 'production'])
  NODE_ENV: 'development' | 'test' | 'production' = 'development';

  @IsString()
  HOST = '127.0.0.1';

  @Transform(({ value }) => Number(value))
  @IsInt()
  @Min(0)
  @Max(65535)
  PORT = 3000;

  @IsUrl({ protocols: ['postgres', 'postgresql'], require_tld: false, require_protocol: true })
  DATABASE_URL = 'postgres://postgres@127.0.0.1:54320/keenroute';

  // The default only suits a local demo; production must set its own (checked below).
  @IsString()
  @MinLength(32)
  JWT_SECRET = 'keenroute-local-development-secret-change-me';

  @IsUrl({ require_tld: false, require_protocol: true })
  APP_URL = 'http://127.0.0.1:3000';

  @IsString()
  SMTP_HOST = '127.0.0.1';

  @Transform(({ value }) => Number(value))
  @IsInt()
  @Min(1)
  @Max(65535)
  SMTP_PORT = 2525;

  @IsString()
  MAIL_FROM = 'Keenroute (demo) <no-reply@demo.keenroute.test>';

  @IsOptional()
  @IsUrl({ require_tld: false, require_protocol: true })
  MAIL_CATCHER_URL?: string;

  @IsOptional()
  @IsString()
  CLIENT_DIST?: string;

  /** Where uploads (shear photos) are kept: outside any folder the web server serves. */
  @IsString()
  DATA_DIR = '.data/app';

  /** An HTTP geocoder of the usual search form (GET {url}/search?q=...&format=json); unset turns look-ups off. */
  @IsOptional()
  @IsUrl({ require_tld: false, require_protocol: true })
  GEOCODER_URL?: string;

  /**
   * A routing service's matrix endpoint of the usual `table` form (`GET {ROUTING_URL}/table/v1/driving/{lon,lat;...}
   * ?annotations=duration,distance`). Unset: great-circle distance times the circuity setting at the average speed.
   */
  @IsOptional()
  @IsUrl({ require_tld: false, require_protocol: true })
  ROUTING_URL?: string;

  /** The business's IANA time zone: what "today" means for coming-due dates. */
  @IsString()
  BUSINESS_TIME_ZONE = 'America/Chicago';

  @IsIn(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent'])
  LOG_LEVEL = 'info';

  /** 'off' keeps this instance from working background jobs (it still queues them), e.g. for a web-only replica. */
  @IsIn(['on', 'off'])
  JOBS_WORKERS: 'on' | 'off' = 'on';

  /** Seconds before a queued e-mail the relay refused is tried again; each later try waits about twice as long. */
  @Transform(({ value }) => Number(value))
  @IsInt()
  @Min(1)
  MAIL_RETRY_DELAY_SECONDS = 30;

  /** Seconds a worker may hold one e-mail job; a worker that died holding it frees it for another after this. */
  @Transform(({ value }) => Number(value))
  @IsInt()
  @Min(1)
  MAIL_JOB_EXPIRE_SECONDS = 300;

  /** How often (seconds) pg-boss looks for jobs whose worker died (expired) and makes them available again. */
  @Transform(({ value }) => Number(value))
  @IsInt()
  @Min(1)
  JOBS_MAINTENANCE_SECONDS = 120;

  /** When visit notices due are queued (cron, in BUSINESS_TIME_ZONE); queueing twice sends nothing twice. */
  @IsString()
  VISIT_NOTICE_CRON = '0 * * * *';

  /** The payment service's secret API key (test mode locally: the stand-in accepts any key of this form). */
  @IsString()
  @Matches(/^(sk|rk)_(test|live)_[A-Za-z0-9_]+$/, {
    message: 'STRIPE_SECRET_KEY must look like sk_test_… or sk_live_…',
  })
  STRIPE_SECRET_KEY = 'sk_test_keenroute_local_stand_in';

  /** The signing secret of the webhook endpoint; events whose signature does not match are refused. */
  @IsString()
  @Matches(/^whsec_[A-Za-z0-9_]+$/, { message: 'STRIPE_WEBHOOK_SECRET must look like whsec_…' })
  STRIPE_WEBHOOK_SECRET = 'whsec_keenroute_local_stand_in_secret';

  /** Where the payment SDK sends its requests: the local stand-in (http://127.0.0.1:12111); unset: the real service. */
  @IsOptional()
  @IsUrl({ require_tld: false, require_protocol: true, protocols: ['http', 'https'] })
  STRIPE_API_URL?: string;

  /** When overdue-invoice reminders are queued (cron, in BUSINESS_TIME_ZONE); queueing twice sends nothing twice. */
  @IsString()
  INVOICE_REMINDER_CRON = '15 8 * * *';

  /** Sign-in attempts allowed per e-mail and address in one minute. */
  @Transform(({ value }) => Number(value))
  @IsInt()
  @Min(1)
  AUTH_RATE_LIMIT = 10;

  /**
   * Which proxies may name the client (X-Forwarded-For): the address the rate limits count by. 'loopback' suits a
   * proxy on the same host; behind a load balancer elsewhere give its hop count (1) or its addresses or subnets,
   * comma-separated, or every client shares the balancer's address and one set of limits.
   */
  @IsString()
  TRUST_PROXY = 'loopback';
}

export type AppConfig = Readonly<Environment>;

const PROXY_RANGES = ['loopback', 'linklocal', 'uniquelocal'];

/** Express's 'trust proxy' setting from TRUST_PROXY: a hop count, or the list of trusted addresses as it is. */
export function trustProxySetting(value: string): number | string {
  return /^\d+$/.test(value) ? Number(value) : value;
}

function trustProxyProblem(value: string): string | null {
  if (/^\d+$/.test(value)) return null;
  const wrong = value
    .split(',')
    .map((item) => item.trim())
    .filter((item) => !PROXY_RANGES.includes(item) && isIP(item.replace(/\/\d{1,3}$/, '')) === 0);
  return wrong.length === 0
    ? null
    : `TRUST_PROXY: "${wrong.join('", "')}" is not a hop count, an address, a subnet or one of ${PROXY_RANGES.join(', ')}`;
}

/** Validates process.env once at start; a bad variable stops the server with a message naming it. */
export function validateEnvironment(raw: Record<string, unknown>): AppConfig {
  const known = Object.keys(new Environment());
  const picked = Object.fromEntries(Object.entries(raw).filter(([key, value]) => known.includes(key) && value !== ''));
  const env = plainToInstance(Environment, picked, { exposeDefaultValues: true });
  const errors = validateSync(env, { skipMissingProperties: false });
  const problems = errors.map((error) => `${error.property}: ${Object.values(error.constraints ?? {}).join('; ')}`);
  if (env.NODE_ENV === 'production' && env.JWT_SECRET === new Environment().JWT_SECRET) {
    problems.push('JWT_SECRET: set a secret of your own in production');
  }
  if (env.NODE_ENV === 'production' && env.STRIPE_WEBHOOK_SECRET === new Environment().STRIPE_WEBHOOK_SECRET) {
    problems.push("STRIPE_WEBHOOK_SECRET: set the webhook endpoint's own signing secret in production");
  }
  const proxyProblem = trustProxyProblem(env.TRUST_PROXY);
  if (proxyProblem) problems.push(proxyProblem);
  if (problems.length > 0) {
    throw new Error(`Keenroute's configuration is not valid:\n  ${problems.join('\n  ')}`);
  }
  return Object.freeze(env);
}

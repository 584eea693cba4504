import path from 'node:path';
import { paths } from './paths.js';
import { SetupError } from './setup-error.js';
import type { ClusterOptions } from './postgres.js';
import { mustRunScript, type Workspace } from './workspace.js';
import { appEnvironment, portFromEnv } from './environment.js';
import { developmentJwtSecret } from './secrets.js';

export const devDatabase = 'keenroute';

/** The development cluster: .data/postgres on 127.0.0.1:54320 unless PGPORT_KEENROUTE says otherwise. */
export function devClusterOptions(alreadyRunning: ClusterOptions['alreadyRunning']): ClusterOptions {
  return {
    dataDir: paths.devPostgres,
    port: portFromEnv('PGPORT_KEENROUTE', 54320),
    logFile: path.join(paths.dataRoot, 'postgres.log'),
    portHint: 'PGPORT_KEENROUTE=54321 npm start',
    alreadyRunning,
  };
}

/** The development ports: PORT, MAIL_CATCHER_SMTP_PORT, MAIL_CATCHER_HTTP_PORT and GEOCODER_PORT override them. */
export function devPorts(): { app: number; smtp: number; outbox: number; geocoder: number } {
  return {
    app: portFromEnv('PORT', 3000),
    smtp: portFromEnv('MAIL_CATCHER_SMTP_PORT', 2525),
    outbox: portFromEnv('MAIL_CATCHER_HTTP_PORT', 1080),
    geocoder: portFromEnv('GEOCODER_PORT', 1090),
  };
}

/** What the API, its migrations and its seed read in development. */
export function devEnvironment(databaseUrl: string): NodeJS.ProcessEnv {
  const ports = devPorts();
  return appEnvironment({
    mode: 'development',
    port: ports.app,
    databaseUrl,
    jwtSecret: developmentJwtSecret(),
    smtpPort: ports.smtp,
    mailCatcherUrl: `http://127.0.0.1:${ports.outbox}`,
    geocoderUrl: `http://127.0.0.1:${ports.geocoder}`,
    dataDir: paths.devApp,
  });
}

/** Builds the workspaces in dependency order. */
export async function buildWorkspaces(workspaces: readonly Workspace[], env?: NodeJS.ProcessEnv): Promise<void> {
  for (const workspace of workspaces) {
    console.log(`Building ${workspace}…`);
    await mustRunScript(workspace, 'build', `Fix the ${workspace} build errors above, then run the command again.`, {
      env,
    });
  }
}

/** TypeORM migrations from server/dist (never synchronize). */
export async function runMigrations(env: NodeJS.ProcessEnv): Promise<void> {
  console.log('Running database migrations…');
  await mustRunScript(
    'server',
    'migration:run',
    'A migration failed: fix it (the error is above). To start the development data over: npm run db:reset',
    { env, silent: true },
  );
}

/** The demo scenario; the seed itself does nothing when the demo data is already there. */
export async function seedDemoData(env: NodeJS.ProcessEnv): Promise<void> {
  console.log('Seeding the demo scenario (skipped by the seed when it is already there)…');
  await mustRunScript('server', 'seed', 'The seed failed: read the error above. To start over: npm run db:reset', {
    env,
    silent: true,
  });
}

/**
 * The demo's route days: signs in as the demo owner and plans this week and next when neither has a route day from
 * today on (the seeded history's days are all past), so the sharpener's Today and My week pages have something to
 * show. Through the API, as a planner would.
 */
export async function planDemoWeeks(origin: string): Promise<void> {
  const login = await fetch(`${origin}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: 'owner@demo.keenroute.test', password: 'keenroute-demo' }),
  });
  if (!login.ok) return console.log('The demo owner could not sign in (password changed?): no demo weeks planned.');
  const { accessToken } = (await login.json()) as { accessToken: string };
  const headers = { authorization: `Bearer ${accessToken}`, 'content-type': 'application/json' };
  const thisWeek = (await (await fetch(`${origin}/api/route-days`, { headers })).json()) as {
    today: string;
    days: { day: string }[];
  };
  const next = new Date(`${thisWeek.today}T12:00:00Z`);
  next.setUTCDate(next.getUTCDate() + 7);
  const nextWeek = next.toISOString().slice(0, 10);
  const nextDays = (await (await fetch(`${origin}/api/route-days?week=${nextWeek}`, { headers })).json()) as {
    days: { day: string }[];
  };
  // The seeded history fills the days already past; only a day still to come means the weeks were planned.
  const ahead = [...thisWeek.days, ...nextDays.days].filter((day) => day.day >= thisWeek.today);
  if (ahead.length > 0) return;
  console.log('Planning the demo route days for this week and next…');
  for (const week of [thisWeek.today, nextWeek]) {
    const planned = await fetch(`${origin}/api/route-days/plan`, {
      method: 'POST',
      headers,
      body: JSON.stringify({ week }),
    });
    // A week with no work day left (a weekend start) is refused with a clear message: nothing to plan, not a failure.
    if (!planned.ok && planned.status !== 400)
      throw new SetupError(`Planning the demo week of ${week} failed (HTTP ${planned.status}).`);
  }
  // Visit notices for the days coming up go out now rather than at the next hourly run; read them in the Outbox.
  await fetch(`${origin}/api/route-days/notices/run`, { method: 'POST', headers, body: '{}' });
}

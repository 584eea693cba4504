import { mkdirSync, rmSync } from 'node:fs';
import path from 'node:path';
import { runMigrations, seedDemoData } from './lib/app-setup.js';
import { ensureChromium } from './lib/chromium.js';
import { appEnvironment, appOrigin, portFromEnv } from './lib/environment.js';
import { paths, repoRoot } from './lib/paths.js';
import { discardCluster, ensureDatabase, startCluster, type Cluster } from './lib/postgres.js';
import { freePort, runCommand, spawnManaged, stopOnSignals, Teardown, waitForHttp } from './lib/processes.js';
import { throwawayJwtSecret, throwawayWebhookSecret } from './lib/secrets.js';
import { SuiteReport } from './lib/suite-report.js';
import { runScript, type Workspace } from './lib/workspace.js';
import { startGeocoder, type Geocoder } from './stand-ins/geocoder.js';
import { startMailCatcher, type MailCatcher } from './stand-ins/mail-catcher.js';
import { startRouting, type Routing } from './stand-ins/routing.js';
import { startStripeStandIn, type StripeStandIn } from './stand-ins/stripe.js';

const suiteTimeoutMs = 15 * 60_000;
// The server's e2e suite starts API processes and a private PostgreSQL for the fault and instance tests, and the
// client's component tests are CPU-bound: on a loaded two-core machine each has taken over 15 minutes.
const longSuiteTimeoutMs = 30 * 60_000;
const buildTimeoutMs = 5 * 60_000;

const report = new SuiteReport();
const teardown = new Teardown();
stopOnSignals(teardown, () => {
  report.halt();
  report.print();
});

const unitEnv: NodeJS.ProcessEnv = { ...process.env, NODE_ENV: 'test', LOG_LEVEL: 'warn' };

function script(workspace: Workspace, name: string, env: NodeJS.ProcessEnv, timeoutMs = suiteTimeoutMs) {
  return () => runScript(workspace, name, { env, timeoutMs });
}

async function startTestCluster(): Promise<Cluster> {
  const dataDir = paths.testPostgres;
  await discardCluster(dataDir);
  const cluster = await startCluster({
    dataDir,
    port: portFromEnv('PGPORT_KEENROUTE_TEST', 54330),
    logFile: path.join(paths.dataRoot, 'test-postgres.log'),
    portHint: 'PGPORT_KEENROUTE_TEST=54331 npm test',
    durable: false,
  });
  teardown.add(
    'stop the test PostgreSQL',
    () => cluster.stop(),
    () => cluster.stopNow(),
  );
  return cluster;
}

async function main(): Promise<void> {
  await report.step('suite', 'scripts: stand-ins (node:test)', () =>
    runCommand(
      'scripts',
      path.join(repoRoot, 'node_modules', '.bin', 'tsx'),
      [
        '--test',
        'scripts/stand-ins/mail-catcher.test.ts',
        'scripts/stand-ins/geocoder.test.ts',
        'scripts/stand-ins/routing.test.ts',
        'scripts/stand-ins/stripe.test.ts',
      ],
      {
        cwd: repoRoot,
        env: unitEnv,
        timeoutMs: 60_000,
      },
    ),
  );

  const sharedBuilt = await report.step(
    'setup',
    'build shared',
    script('shared', 'build', process.env, buildTimeoutMs),
  );
  await report.step('suite', 'shared (vitest + coverage)', script('shared', 'test', unitEnv));
  // The same check developers run: every workspace typechecks, ESLint's type-checked rules, Prettier.
  await report.step('suite', 'check: types, lint, format', () =>
    runCommand('check', 'npm', ['run', '-s', 'check'], { cwd: repoRoot, env: unitEnv, timeoutMs: suiteTimeoutMs }),
  );

  let cluster: Cluster | undefined;
  let catcher: MailCatcher | undefined;
  let geocoder: Geocoder | undefined;
  let routing: Routing | undefined;
  let payments: StripeStandIn | undefined;
  const webhookSecret = throwawayWebhookSecret();
  await report.step('setup', 'test PostgreSQL + keenroute_test', async () => {
    cluster = await startTestCluster();
    await ensureDatabase(cluster, 'keenroute_test');
  });
  await report.step('setup', 'mail catcher', async () => {
    catcher = await startMailCatcher({ smtpPort: 0, httpPort: 0, host: '127.0.0.1' });
    teardown.add('stop the mail catcher', () => catcher?.stop());
    console.log(`Mail catcher: SMTP 127.0.0.1:${catcher.smtpPort}, API ${catcher.url}`);
  });
  await report.step('setup', 'geocoder stand-in', async () => {
    geocoder = await startGeocoder({ port: 0, host: '127.0.0.1' });
    teardown.add('stop the geocoder stand-in', () => geocoder?.stop());
    console.log(`Geocoder stand-in: ${geocoder.url}`);
  });
  await report.step('setup', 'routing stand-in', async () => {
    routing = await startRouting({ port: 0, host: '127.0.0.1' });
    teardown.add('stop the routing stand-in', () => routing?.stop());
    console.log(`Routing stand-in: ${routing.url}`);
  });
  // The e2e tests post their own signed webhooks, so this one sends none.
  await report.step('setup', 'payment stand-in', async () => {
    payments = await startStripeStandIn({ port: 0, host: '127.0.0.1', webhookSecret });
    teardown.add('stop the payment stand-in', () => payments?.stop());
    console.log(`Payment stand-in: ${payments.url}`);
  });

  const jwtSecret = throwawayJwtSecret();
  rmSync(paths.testApp, { recursive: true, force: true });
  const testEnv = (db: string, port: number, stripe: StripeStandIn) =>
    appEnvironment({
      mode: 'test',
      port,
      databaseUrl: cluster!.url(db),
      jwtSecret,
      smtpPort: catcher!.smtpPort,
      mailCatcherUrl: catcher!.url,
      geocoderUrl: geocoder!.url,
      routingUrl: routing!.url,
      stripeApiUrl: stripe.url,
      stripeWebhookSecret: webhookSecret,
      dataDir: paths.testApp,
    });

  await report.step('suite', 'server unit (jest)', script('server', 'test', unitEnv));
  if (cluster && catcher && geocoder && routing && payments) {
    await report.step(
      'suite',
      'server e2e (jest + supertest)',
      script('server', 'test:e2e', testEnv('keenroute_test', await freePort(), payments), longSuiteTimeoutMs),
    );
  } else {
    report.blocked('server e2e (jest + supertest)', 'the test PostgreSQL or a stand-in did not start');
  }
  await report.step('suite', 'client (vitest)', script('client', 'test', unitEnv, longSuiteTimeoutMs));

  const serverBuilt = await report.step(
    'setup',
    'build server',
    script('server', 'build', process.env, buildTimeoutMs),
  );
  const clientBuilt = await report.step(
    'setup',
    'build client',
    script('client', 'build', process.env, buildTimeoutMs),
  );
  if (!(sharedBuilt && serverBuilt && clientBuilt && cluster && catcher && geocoder && routing && payments)) {
    report.blocked('browser (playwright-core + Chromium)', 'a build, the test PostgreSQL or a stand-in failed');
    return;
  }

  const apiPort = await freePort();
  // The browser app's checkout posts its webhooks back to that API, so the API's port is picked first.
  const browserPayments = await startStripeStandIn({
    port: 0,
    host: '127.0.0.1',
    webhookUrl: `${appOrigin(apiPort)}/api/webhooks/stripe`,
    webhookSecret,
  });
  teardown.add('stop the browser payment stand-in', () => browserPayments.stop());
  // Every browser journey signs the same demo people in from 127.0.0.1, the owner a dozen times within a minute when
  // the machine is quick: the product's limit (10 a minute per address and e-mail) would refuse the later journeys.
  // The limit itself is proven by the server's e2e tests (auth, and across instances).
  const browserEnv = { ...testEnv('keenroute_browser', apiPort, browserPayments), AUTH_RATE_LIMIT: '200' };
  const origin = appOrigin(apiPort);
  let chromium: string | undefined;
  const ready = await report.step('setup', 'browser app: database, API, Chromium', async () => {
    await ensureDatabase(cluster!, 'keenroute_browser');
    await runMigrations(browserEnv);
    await seedDemoData(browserEnv);
    const api = spawnManaged('api', process.execPath, [paths.serverMain], {
      env: browserEnv,
      cwd: path.join(repoRoot, 'server'),
    });
    teardown.add('stop the API', () => api.stop(10_000));
    await waitForHttp(`${origin}/api/health`, api, 90_000);
    chromium = await ensureChromium();
    await fetch(`${catcher!.url}/messages`, { method: 'DELETE' });
  });
  if (!ready || !chromium) {
    report.blocked('browser (playwright-core + Chromium)', 'the browser app did not start');
    return;
  }
  mkdirSync(paths.artifacts, { recursive: true });
  await report.step(
    'suite',
    'browser (playwright-core + Chromium)',
    script('client', 'test:browser', {
      ...browserEnv,
      BASE_URL: origin,
      MAIL_CATCHER_URL: catcher.url,
      CHROMIUM_PATH: chromium,
      ARTIFACTS_DIR: paths.artifacts,
    }),
  );
}

try {
  await main();
} catch (error) {
  await report.step('setup', 'npm test itself', () => {
    throw error;
  });
} finally {
  if (!teardown.started) {
    console.log('\nStopping what the tests started…');
    await teardown.run();
    report.print();
    process.exit(report.failed ? 1 : 0);
  }
}

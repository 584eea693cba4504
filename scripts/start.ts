import path from 'node:path';
import {
  buildWorkspaces,
  devClusterOptions,
  devDatabase,
  devEnvironment,
  devPorts,
  runMigrations,
  planDemoWeeks,
  seedDemoData,
} from './lib/app-setup.js';
import { invoiceDemoTickets } from './lib/demo-invoices.js';
import { appOrigin, portFromEnv } from './lib/environment.js';
import { paths, repoRoot, shown } from './lib/paths.js';
import { ensureDatabase, ensurePostgres, startCluster } from './lib/postgres.js';
import { assertPortFree, spawnManaged, stopOnSignals, Teardown, waitForHttp } from './lib/processes.js';
import { throwawayWebhookSecret } from './lib/secrets.js';
import { describeFailure, SetupError } from './lib/setup-error.js';
import { startGeocoder } from './stand-ins/geocoder.js';
import { startMailCatcher } from './stand-ins/mail-catcher.js';
import { startStripeStandIn } from './stand-ins/stripe.js';

const demoSignIns = [
  ['owner', 'owner@demo.keenroute.test'],
  ['office', 'office@demo.keenroute.test'],
  ['sharpener', 'sharpener@demo.keenroute.test'],
  ['client', 'client@demo.keenroute.test'],
  ['client (shop manager)', 'manager@demo.keenroute.test'],
] as const;

const teardown = new Teardown();
stopOnSignals(teardown);

async function main(): Promise<void> {
  const { app: appPort, smtp: smtpPort, outbox: outboxPort, geocoder: geocoderPort } = devPorts();
  // Checked before the slow steps, so a second `npm start` says so at once.
  await assertPortFree(appPort, 'Keenroute', `PORT=${appPort + 1} npm start`);
  await assertPortFree(smtpPort, "the mail catcher's SMTP side", `MAIL_CATCHER_SMTP_PORT=${smtpPort + 1} npm start`);
  await assertPortFree(outboxPort, "the mail catcher's HTTP API", `MAIL_CATCHER_HTTP_PORT=${outboxPort + 1} npm start`);
  await assertPortFree(geocoderPort, 'the geocoder stand-in', `GEOCODER_PORT=${geocoderPort + 1} npm start`);
  const paymentsPort = portFromEnv('STRIPE_STAND_IN_PORT', 12111);
  await assertPortFree(paymentsPort, 'the payment stand-in', `STRIPE_STAND_IN_PORT=${paymentsPort + 1} npm start`);

  await ensurePostgres();
  const cluster = await startCluster(devClusterOptions('take-over'));
  teardown.add(
    'stop PostgreSQL',
    () => cluster.stop(),
    () => cluster.stopNow(),
  );
  await ensureDatabase(cluster, devDatabase);

  await buildWorkspaces(['shared', 'server', 'client']);

  const catcher = await startMailCatcher({ smtpPort, httpPort: outboxPort, host: '127.0.0.1' });
  teardown.add('stop the mail catcher', () => catcher.stop());
  const geocoder = await startGeocoder({ port: geocoderPort, host: '127.0.0.1' });
  teardown.add('stop the geocoder stand-in', () => geocoder.stop());
  // A new signing secret each start is enough: the stand-in and the app it signs for start and stop together.
  const webhookSecret = throwawayWebhookSecret();
  const payments = await startStripeStandIn({
    port: paymentsPort,
    host: '127.0.0.1',
    webhookUrl: `${appOrigin(appPort)}/api/webhooks/stripe`,
    webhookSecret,
  });
  teardown.add('stop the payment stand-in', () => payments.stop());

  const env = {
    ...devEnvironment(cluster.url(devDatabase)),
    STRIPE_API_URL: payments.url,
    STRIPE_WEBHOOK_SECRET: webhookSecret,
  };
  await runMigrations(env);
  await seedDemoData(env);

  const api = spawnManaged('api', process.execPath, [paths.serverMain], { env, cwd: path.join(repoRoot, 'server') });
  teardown.add('stop the API', () => api.stop(10_000));
  const origin = appOrigin(appPort);
  await waitForHttp(`${origin}/api/health`, api, 90_000);
  await planDemoWeeks(origin);
  await invoiceDemoTickets(origin);

  console.log(
    [
      '',
      `Keenroute is running:  ${origin}`,
      `  Outbox (e-mail caught on this machine): ${catcher.url}/messages  (owners also see it in the app)`,
      `  Geocoder stand-in (knows the invented demo city's addresses): ${geocoder.url}/search?q=...&format=json`,
      `  Payment stand-in (pretend checkout, no real money): ${payments.url}/__stand-in/events`,
      `  API docs: ${origin}/api/docs`,
      `  Database: ${cluster.url(devDatabase)}  (data in ${shown(cluster.dataDir)}; reset with npm run db:reset)`,
      '',
      '  Demo sign-ins, password keenroute-demo (demo data only: change these before real use):',
      ...demoSignIns.map(([role, email]) => `    ${role.padEnd(23)} ${email}`),
      '',
      'Press Ctrl-C to stop the API, the mail catcher, the geocoder and payment stand-ins and PostgreSQL.',
      '',
    ].join('\n'),
  );

  const { code, signal } = await api.exited;
  if (teardown.started) return;
  throw new SetupError(`The API stopped on its own (${signal ?? `exit code ${code}`}): read its output above.`);
}

main().catch(async (error: unknown) => {
  if (teardown.started) return;
  console.error(`\n${describeFailure(error)}`);
  await teardown.run();
  process.exit(1);
});

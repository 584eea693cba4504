import { buildWorkspaces, devClusterOptions, devDatabase, devEnvironment, runMigrations } from './lib/app-setup.js';
import { ensureDatabase, startCluster } from './lib/postgres.js';
import { stopOnSignals, Teardown } from './lib/processes.js';
import { describeFailure } from './lib/setup-error.js';

/** `npm run db:migrate`: pending migrations into the development database, keeping its data. */
const teardown = new Teardown();
stopOnSignals(teardown);

async function main(): Promise<void> {
  const cluster = await startCluster(devClusterOptions('share'));
  teardown.add(
    'stop PostgreSQL',
    () => cluster.stop(),
    () => cluster.stopNow(),
  );
  await ensureDatabase(cluster, devDatabase);
  await buildWorkspaces(['shared', 'server']);
  await runMigrations(devEnvironment(cluster.url(devDatabase)));
  console.log(`Database ${devDatabase} is up to date.`);
}

main()
  .then(() => teardown.run())
  .catch(async (error: unknown) => {
    if (teardown.started) return;
    console.error(`\n${describeFailure(error)}`);
    await teardown.run();
    process.exit(1);
  });

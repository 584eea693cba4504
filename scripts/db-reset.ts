import {
  buildWorkspaces,
  devClusterOptions,
  devDatabase,
  devEnvironment,
  runMigrations,
  seedDemoData,
} from './lib/app-setup.js';
import { dropDatabase, ensureDatabase, startCluster } from './lib/postgres.js';
import { stopOnSignals, Teardown } from './lib/processes.js';
import { describeFailure } from './lib/setup-error.js';

/** `npm run db:reset`: the development database dropped, migrated and seeded afresh. */
const teardown = new Teardown();
stopOnSignals(teardown);

async function main(): Promise<void> {
  const cluster = await startCluster(devClusterOptions('share'));
  teardown.add(
    'stop PostgreSQL',
    () => cluster.stop(),
    () => cluster.stopNow(),
  );
  await buildWorkspaces(['shared', 'server']);
  console.log(`Dropping database ${devDatabase} (all development data) and creating it empty…`);
  await dropDatabase(cluster, devDatabase);
  await ensureDatabase(cluster, devDatabase);
  const env = devEnvironment(cluster.url(devDatabase));
  await runMigrations(env);
  await seedDemoData(env);
  console.log(
    `Database ${devDatabase} is back to the demo scenario.` +
      (cluster.startedHere
        ? ''
        : ' PostgreSQL was already running, so it is left running; a running API signs everyone out.'),
  );
}

main()
  .then(() => teardown.run())
  .catch(async (error: unknown) => {
    if (teardown.started) return;
    console.error(`\n${describeFailure(error)}`);
    await teardown.run();
    process.exit(1);
  });

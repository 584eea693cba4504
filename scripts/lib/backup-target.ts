import path from 'node:path';
import { devClusterOptions, devDatabase } from './app-setup.js';
import { paths, repoRoot, shown } from './paths.js';
import { startCluster } from './postgres.js';
import type { Teardown } from './processes.js';
import { SetupError } from './setup-error.js';

export interface AppData {
  databaseUrl: string;
  dataDir: string;
}

/**
 * The database and uploads folder the app uses: DATABASE_URL and DATA_DIR when set (a deployed server), otherwise the
 * ones `npm start` uses, the keenroute database on the private PostgreSQL in .data/postgres (started for the command
 * and stopped after, or shared when it already runs) and .data/app.
 */
export async function appData(teardown: Teardown, purpose: 'backup' | 'restore'): Promise<AppData> {
  const dataDir = path.resolve(repoRoot, process.env.DATA_DIR || paths.devApp);
  const fromEnv = process.env.DATABASE_URL;
  if (fromEnv) return { databaseUrl: fromEnv, dataDir };
  const cluster = await startCluster(devClusterOptions('share'));
  teardown.add(
    'stop PostgreSQL',
    () => cluster.stop(),
    () => cluster.stopNow(),
  );
  const exists = await cluster.psql(`SELECT 1 FROM pg_database WHERE datname = '${devDatabase}'`);
  if (purpose === 'backup' && exists !== '1') {
    throw new SetupError(
      `There is no ${devDatabase} database in ${shown(cluster.dataDir)} yet: npm start creates it. ` +
        'To back up another database, set DATABASE_URL (and DATA_DIR).',
    );
  }
  return { databaseUrl: cluster.url(devDatabase), dataDir };
}

import { restoreBackup } from './lib/backup-archive.js';
import { appData } from './lib/backup-target.js';
import { shown } from './lib/paths.js';
import { shownUrl } from './lib/pg-tools.js';
import { stopOnSignals, Teardown } from './lib/processes.js';
import { describeFailure, SetupError } from './lib/setup-error.js';

/**
 * `npm run restore -- [--force] FILE`: a backup into an empty (or not yet created) database and an empty DATA_DIR.
 * --force replaces what is there: the database is dropped and created empty, DATA_DIR's files are moved aside.
 */
const teardown = new Teardown();
stopOnSignals(teardown);

async function main(): Promise<void> {
  const args = process.argv.slice(2);
  const force = args.includes('--force');
  const files = args.filter((arg) => arg !== '--force');
  if (files.length !== 1 || files[0]!.startsWith('-')) {
    throw new SetupError('Usage: npm run restore -- [--force] FILE   (FILE: a tar written by npm run backup)');
  }
  const { databaseUrl, dataDir } = await appData(teardown, 'restore');
  console.log(`Restoring ${shown(files[0]!)} into ${shownUrl(databaseUrl)} and ${shown(dataDir)}…`);
  const result = await restoreBackup({ file: files[0]!, databaseUrl, dataDir, force });
  console.log(
    `Restored the backup of ${result.manifest.database} taken ${result.manifest.createdAt}: ${result.tables} tables, ` +
      `${result.files} files in DATA_DIR (${(result.ms / 1000).toFixed(1)} s).` +
      (result.setAside ? `\nThe files DATA_DIR held before are in ${shown(result.setAside)}.` : '') +
      '\nA restored database may be behind this checkout: npm start (or npm run db:migrate) runs pending migrations.',
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

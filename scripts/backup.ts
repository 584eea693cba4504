import path from 'node:path';
import { backupStamp, createBackup } from './lib/backup-archive.js';
import { appData } from './lib/backup-target.js';
import { repoRoot, shown } from './lib/paths.js';
import { shownUrl } from './lib/pg-tools.js';
import { stopOnSignals, Teardown } from './lib/processes.js';
import { describeFailure, SetupError } from './lib/setup-error.js';

/** `npm run backup [-- FILE]`: the database and DATA_DIR in one tar file, backups/keenroute-<UTC time>.tar by default. */
const teardown = new Teardown();
stopOnSignals(teardown);

async function main(): Promise<void> {
  const args = process.argv.slice(2);
  if (args.length > 1 || args[0]?.startsWith('-')) {
    throw new SetupError('Usage: npm run backup [-- FILE]   (default: backups/keenroute-<UTC time>.tar)');
  }
  const file = args[0] ? path.resolve(args[0]) : path.join(repoRoot, 'backups', `keenroute-${backupStamp()}.tar`);
  const { databaseUrl, dataDir } = await appData(teardown, 'backup');
  console.log(`Backing up ${shownUrl(databaseUrl)} and ${shown(dataDir)}…`);
  const result = await createBackup({ databaseUrl, dataDir, file });
  console.log(
    `Backup written: ${shown(result.file)}  (${kib(result.bytes)}: database dump ${kib(result.dumpBytes)}, ` +
      `${result.files} files from DATA_DIR; ${(result.ms / 1000).toFixed(1)} s)\n` +
      `Restore it with:  npm run restore -- ${shown(result.file)}`,
  );
}

function kib(bytes: number): string {
  return bytes < 1024 * 1024 ? `${(bytes / 1024).toFixed(0)} KiB` : `${(bytes / 1024 / 1024).toFixed(1)} MiB`;
}

main()
  .then(() => teardown.run())
  .catch(async (error: unknown) => {
    if (teardown.started) return;
    console.error(`\n${describeFailure(error)}`);
    await teardown.run();
    process.exit(1);
  });

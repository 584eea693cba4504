import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

// Imported first by the benchmarks: the app reads its environment when its modules load.
if (!process.env.DATABASE_URL) {
  throw new Error('Set DATABASE_URL to a scratch PostgreSQL database (the benchmark adds rows to it).');
}
// Request logs would flood the figures and cost time of their own.
process.env.LOG_LEVEL ??= 'warn';
// Uploads, if any module writes them, go to a throwaway folder rather than into the repository.
process.env.DATA_DIR ??= mkdtempSync(join(tmpdir(), 'keenroute-bench-'));

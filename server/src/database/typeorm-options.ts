import type { DataSourceOptions } from 'typeorm';
import { entities } from './entities';
import { migrations } from './migrations';

/** One definition of the connection for the app, the CLI and the seed. Schema changes only through migrations. */
export function typeormOptions(databaseUrl: string): DataSourceOptions {
  return {
    type: 'postgres',
    url: databaseUrl,
    entities,
    migrations,
    synchronize: false,
    migrationsRun: false,
    // JIT compiling cost the reports 100-230 ms a statement and saved less than that on three years of work, and the
    // app's other statements are too short to gain from it (docs/benchmarks.md), so every connection starts with it off.
    extra: { max: 20, connectionTimeoutMillis: 5000, options: '-c jit=off' },
  };
}

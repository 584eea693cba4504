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
    extra: { max: 20, connectionTimeoutMillis: 5000 },
  };
}

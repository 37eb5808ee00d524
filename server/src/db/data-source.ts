// The one way the server opens PostgreSQL. Schema changes go through MIGRATIONS, never `synchronize`.
import 'reflect-metadata';
import { types } from 'pg';
import { DataSource } from 'typeorm';
import { ENTITIES } from './entities';
import { MIGRATIONS } from './migrations';

// Plain JSON values everywhere, also for raw queries: a `date` column reads as 'YYYY-MM-DD' (not a Date at local
// midnight), and bigint (change_seq, count(*)) as a number — safe, as these stay far below 2^53.
types.setTypeParser(types.builtins.DATE, (v: string) => v);
types.setTypeParser(types.builtins.INT8, (v: string) => Number(v));

export interface DataSourceOptions {
  url: string;
  /** Connections in the pool (default 10). */
  poolSize?: number;
}

export function createDataSource({ url, poolSize = 10 }: DataSourceOptions): DataSource {
  return new DataSource({
    type: 'postgres',
    url,
    entities: ENTITIES,
    migrations: MIGRATIONS,
    migrationsTransactionMode: 'each',
    synchronize: false,
    logging: false,
    poolSize,
  });
}

/** Opens the data source and applies every pending migration; returns the names of those applied. */
export async function openAndMigrate(ds: DataSource): Promise<string[]> {
  if (!ds.isInitialized) await ds.initialize();
  const applied = await ds.runMigrations({ transaction: 'each' });
  return applied.map((m) => m.name);
}

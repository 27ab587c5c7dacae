import 'reflect-metadata';
import fs from 'node:fs';
import path from 'node:path';
import { DataSource } from 'typeorm';
import { ENTITIES } from './entities';
import { MIGRATIONS } from './migrations';

/**
 * The server's database: one SQLite file in WAL mode. Schema only through the hand-written
 * migrations, run on initialize; never synchronize.
 */
export function createDataSource(databasePath: string): DataSource {
  if (databasePath !== ':memory:') fs.mkdirSync(path.dirname(databasePath), { recursive: true });
  return new DataSource({
    type: 'better-sqlite3',
    database: databasePath,
    enableWAL: true,
    // WAL + NORMAL survives a killed process (only an OS crash can lose the last commits).
    prepareDatabase: (db: { pragma: (s: string) => unknown }) => {
      db.pragma('synchronous = NORMAL');
      db.pragma('busy_timeout = 5000');
    },
    entities: ENTITIES,
    migrations: MIGRATIONS,
    migrationsRun: true,
    synchronize: false,
    logging: false,
  });
}

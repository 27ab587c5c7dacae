import 'reflect-metadata';
import fs from 'node:fs';
import path from 'node:path';
import { DataSource, type EntityManager } from 'typeorm';
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

const locks = new WeakMap<DataSource, Promise<unknown>>();

/**
 * Runs `fn` in a transaction, one at a time per data source. TypeORM's better-sqlite3 driver has a
 * single connection and treats a second concurrent `transaction()` as a nested SAVEPOINT inside
 * the first, so two requests interleaving at an `await` would share (and could roll back) each
 * other's work. Every write in the server goes through here; reads may run outside.
 */
export function tx<T>(ds: DataSource, fn: (m: EntityManager) => Promise<T>): Promise<T> {
  return exclusive(ds, () => ds.transaction(fn));
}

/**
 * Runs `fn` (reads, no transaction) between transactions, never inside one. For reads whose
 * result is cached by the library change number: read in the middle of a transaction that then
 * rolls back, they could cache rows that never existed under a change number that will be
 * reused. better-sqlite3 is synchronous, so waiting here costs next to nothing.
 */
export function exclusive<T>(ds: DataSource, fn: () => Promise<T>): Promise<T> {
  const previous = locks.get(ds) ?? Promise.resolve();
  const run = previous.catch(() => undefined).then(fn);
  locks.set(ds, run.catch(() => undefined));
  return run;
}

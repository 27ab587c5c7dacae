import 'reflect-metadata';
import * as SQLite from 'expo-sqlite';
import { DataSource } from 'typeorm';
import { LocalLibraryEntry } from './entities/LocalLibraryEntry';
import { LocalSetting } from './entities/LocalSetting';
import { LocalAnalysis } from './entities/LocalAnalysis';
import { LocalOutboxItem } from './entities/LocalOutboxItem';
import { LocalInit1733000000000 } from './migrations/1733000000000-LocalInit';
import { LocalWork1733100000000 } from './migrations/1733100000000-LocalWork';
import { OutboxOwner1733200000000 } from './migrations/1733200000000-OutboxOwner';

/** Every local entity; add new ones here and a migration beside them. */
export const LOCAL_ENTITIES = [LocalLibraryEntry, LocalSetting, LocalAnalysis, LocalOutboxItem];
export const LOCAL_MIGRATIONS = [LocalInit1733000000000, LocalWork1733100000000, OutboxOwner1733200000000];

let ready: Promise<DataSource> | null = null;

/**
 * The device database (expo-sqlite's async API through TypeORM's expo driver). On the web it
 * lives in the browser's private file system and survives reloads and going offline.
 */
export function getLocalDb(): Promise<DataSource> {
  if (!ready) {
    const ds = new DataSource({
      type: 'expo',
      database: 'tessera.db',
      driver: SQLite,
      entities: LOCAL_ENTITIES,
      migrations: LOCAL_MIGRATIONS,
      migrationsRun: true,
      synchronize: false,
      logging: false,
    });
    ready = ds.initialize().catch((err: unknown) => {
      ready = null;
      throw err;
    });
  }
  return ready;
}

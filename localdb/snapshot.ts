import { LibraryFileSchema, type LibraryEntry } from '../shared/libraryEntry';
import { localLibraryCount, localLibraryUpsert } from './library';
import { settingGet, settingSet } from './settings';

interface JsonContext {
  keys(): string[];
  (key: string): unknown;
}

// Metro bundles every library file of library-data/ (require.context is on in Expo's Metro
// config, expo-router needs it). New library files ship without touching this module.
const files = (require as unknown as { context(dir: string, deep: boolean, re: RegExp): JsonContext }).context('../library-data', false, /\.json$/);

/** The approved library as it was when the app was built (library-data/*.json). */
export function snapshotEntries(): LibraryEntry[] {
  const out: LibraryEntry[] = [];
  for (const key of files.keys()) {
    const parsed = LibraryFileSchema.safeParse(files(key));
    if (parsed.success) out.push(...parsed.data.entries.filter((e) => !e.retired));
  }
  return out;
}

const SEEDED_KEY = 'library.snapshotLoaded';

/**
 * First start: an empty device library is filled from the shipped snapshot, so analysis works
 * before (or without) any connection. Sync later replaces entries by their server revisions.
 */
export function snapshotLoadIfEmpty(): Promise<number> {
  // Once per app start; later calls share the first (the query and sync both ask at start).
  loading ??= load().catch((err: unknown) => {
    loading = null;
    throw err;
  });
  return loading;
}

let loading: Promise<number> | null = null;

async function load(): Promise<number> {
  if ((await localLibraryCount()) > 0) return 0;
  if (await settingGet(SEEDED_KEY)) return 0; // emptied on purpose by sync tombstones
  const entries = snapshotEntries();
  await localLibraryUpsert(entries);
  await settingSet(SEEDED_KEY, new Date().toISOString());
  return entries.length;
}

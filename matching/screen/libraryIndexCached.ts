import type { LibraryEntry } from '../../shared/libraryEntry';
import type { Nucleus } from '../../shared/nucleus';
import { libraryIndexBuild, type LibraryIndex, type LibraryIndexOptions } from './libraryIndexBuild';

const cache = new WeakMap<readonly LibraryEntry[], Map<string, { length: number; first: LibraryEntry; last: LibraryEntry; index: LibraryIndex }>>();

/**
 * The shift index of a library array, built once and reused while the same array (same length,
 * same first and last entry objects) is screened again at the same nucleus and MHz — the app and
 * the CLI screen many mixtures against one library. Entries are treated as immutable: edit a
 * library by making a new array (a changed entry object inside the same array is not noticed).
 */
export function libraryIndexCached(entries: readonly LibraryEntry[], nucleus: Nucleus, mhz: number, options: LibraryIndexOptions = {}): LibraryIndex {
  const key = `${nucleus}|${mhz}|${options.includeRetired ? 1 : 0}|${options.solvent ?? '*'}|${options.binWidthPpm ?? ''}`;
  let byKey = cache.get(entries);
  if (!byKey) {
    byKey = new Map();
    cache.set(entries, byKey);
  }
  const hit = byKey.get(key);
  if (hit && hit.length === entries.length && hit.first === entries[0] && hit.last === entries[entries.length - 1]) return hit.index;
  const index = libraryIndexBuild(entries, nucleus, mhz, options);
  byKey.set(key, { length: entries.length, first: entries[0], last: entries[entries.length - 1], index });
  return index;
}

import Fuse from 'fuse.js';
import type { DataSource } from 'typeorm';
import type { LibraryEntry as EntryBody } from '../../shared/libraryEntry';
import { exclusive } from '../data-source';
import { LibraryEntry } from '../entities/LibraryEntry';
import { rowToEntry } from '../library/service';

/** The current library parsed once and reused until it changes (the checks run on every submission). */
export interface LibrarySnapshot {
  seq: number;
  entries: EntryBody[];
  byId: Map<string, EntryBody>;
  fuse: Fuse<NameKey>;
}

/** Names compared without case, spaces or punctuation: "Ethyl-acetate" and "ethyl acetate" are one name. */
export interface NameKey {
  entry: EntryBody;
  keys: string[];
}

export const nameKey = (s: string) => s.toLowerCase().normalize('NFKD').replace(/[^\p{L}\p{N}]+/gu, '');

const cache = new WeakMap<DataSource, LibrarySnapshot>();

/** One cheap query decides whether the cached snapshot is still the library; a second reloads it. */
export function librarySnapshot(ds: DataSource): Promise<LibrarySnapshot> {
  return exclusive(ds, () => load(ds));
}

async function load(ds: DataSource): Promise<LibrarySnapshot> {
  const [{ s }]: { s: number | null }[] = await ds.query('SELECT MAX("seq") AS s FROM "library_entry"');
  const seq = s ?? 0;
  const cached = cache.get(ds);
  if (cached && cached.seq === seq) return cached;
  const rows = await ds.getRepository(LibraryEntry).find({ where: { status: 'current' } });
  const entries = rows.map(rowToEntry);
  const snapshot: LibrarySnapshot = {
    seq,
    entries,
    byId: new Map(entries.map((e) => [e.id, e])),
    fuse: new Fuse(
      entries.map((entry) => ({ entry, keys: [entry.name, ...(entry.synonyms ?? [])].map(nameKey) })),
      { keys: ['keys'], includeScore: true, threshold: 0.3, ignoreLocation: true, ignoreFieldNorm: true },
    ),
  };
  cache.set(ds, snapshot);
  return snapshot;
}

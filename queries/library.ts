import { useQuery } from '@tanstack/react-query';
import Fuse from 'fuse.js';
import type { LibraryEntry } from '../shared';
import type { Nucleus } from '../shared/nucleus';
import { localLibraryGet, localLibraryList } from '../localdb/library';
import { snapshotLoadIfEmpty } from '../localdb/snapshot';
import { STALE_TIME_LOCAL_MS } from '../constants/query';

export const libraryKeys = {
  all: ['library'] as const,
  list: () => [...libraryKeys.all, 'list'] as const,
  entry: (id: string) => [...libraryKeys.all, 'entry', id] as const,
};

/** The library as stored on this device (filled from the shipped snapshot on first start). The UI reads only from here. */
export function useLibraryQuery() {
  return useQuery({
    queryKey: libraryKeys.list(),
    queryFn: async () => {
      await snapshotLoadIfEmpty();
      return localLibraryList();
    },
    staleTime: STALE_TIME_LOCAL_MS,
  });
}

export function useEntryQuery(id: string) {
  return useQuery({
    queryKey: libraryKeys.entry(id),
    queryFn: async () => {
      await snapshotLoadIfEmpty();
      return localLibraryGet(id);
    },
    staleTime: STALE_TIME_LOCAL_MS,
  });
}

export interface LibraryFilter {
  text: string;
  nucleus: Nucleus | null;
  solvent: string | null;
  category: LibraryEntry['category'] | null;
}

/** Fuzzy search (fuse.js) over names, synonyms, formula and id, then the exact filters. */
export function libraryFilter(entries: LibraryEntry[], fuse: Fuse<LibraryEntry> | null, f: LibraryFilter): LibraryEntry[] {
  const q = f.text.trim();
  const base = q && fuse ? fuse.search(q).map((r) => r.item) : entries;
  return base.filter(
    (e) => (!f.nucleus || e.signals.some((s) => s.nucleus === f.nucleus)) && (!f.solvent || e.solvent === f.solvent) && (!f.category || e.category === f.category),
  );
}

export function libraryFuse(entries: LibraryEntry[]): Fuse<LibraryEntry> {
  return new Fuse(entries, {
    keys: [
      { name: 'name', weight: 3 },
      { name: 'synonyms', weight: 2 },
      { name: 'formula', weight: 1 },
      { name: 'id', weight: 0.5 },
    ],
    threshold: 0.35,
    ignoreLocation: true,
  });
}

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { LibraryListResponseSchema, type LibraryEntry } from '../shared';
import { apiRequest } from '../client/api';
import { localLibraryGet, localLibraryList, localLibraryUpsert } from '../localdb/library';
import { STALE_TIME_LOCAL_MS } from '../constants/query';

export const libraryKeys = {
  all: ['library'] as const,
  list: () => [...libraryKeys.all, 'list'] as const,
  entry: (id: string) => [...libraryKeys.all, 'entry', id] as const,
};

/** The library as stored on this device. The UI reads only from here. */
export function useLibraryQuery() {
  return useQuery({ queryKey: libraryKeys.list(), queryFn: localLibraryList, staleTime: STALE_TIME_LOCAL_MS });
}

export function useEntryQuery(id: string) {
  return useQuery({ queryKey: libraryKeys.entry(id), queryFn: () => localLibraryGet(id), staleTime: STALE_TIME_LOCAL_MS });
}

/** Pull the approved library from the server into the local database, then re-read it. */
export function usePullLibraryMutation(token: string | null) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (): Promise<LibraryEntry[]> => {
      const res = LibraryListResponseSchema.parse(await apiRequest<unknown>('/api/library', { token }));
      await localLibraryUpsert(res.entries);
      return res.entries;
    },
    onSuccess: () => qc.invalidateQueries({ queryKey: libraryKeys.all }),
  });
}

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { analysisDelete, analysisGet, analysisList, analysisSave, type StoredAnalysis } from '../localdb/analyses';
import { analysisRun, type AnalysisInput, type AnalysisStage } from '../client/analysisRun';
import { localLibraryList } from '../localdb/library';
import { snapshotLoadIfEmpty } from '../localdb/snapshot';
import { STALE_TIME_LOCAL_MS } from '../constants/query';

export const analysisKeys = {
  all: ['analyses'] as const,
  list: () => [...analysisKeys.all, 'list'] as const,
  one: (id: string) => [...analysisKeys.all, 'one', id] as const,
};

export function useAnalysisListQuery() {
  return useQuery({ queryKey: analysisKeys.list(), queryFn: analysisList, staleTime: STALE_TIME_LOCAL_MS });
}

export function useAnalysisQuery(id: string) {
  return useQuery({ queryKey: analysisKeys.one(id), queryFn: () => analysisGet(id), staleTime: Infinity });
}

async function deviceLibrary() {
  await snapshotLoadIfEmpty();
  return localLibraryList();
}

/** Run an analysis against the library on this device and keep it in the history. */
export function useRunAnalysisMutation() {
  const qc = useQueryClient();
  const [stage, setStage] = useState<AnalysisStage | null>(null);
  const mutation = useMutation({
    mutationFn: async (input: AnalysisInput): Promise<StoredAnalysis> => {
      const library = await deviceLibrary();
      const result = await analysisRun(input, library, setStage);
      await analysisSave(result);
      return result;
    },
    onSuccess: (a) => {
      qc.setQueryData(analysisKeys.one(a.id), a);
      void qc.invalidateQueries({ queryKey: analysisKeys.list() });
    },
    onSettled: () => setStage(null),
  });
  return { ...mutation, stage };
}

/** Several files, one after another, each kept in the history; failures are reported per file. */
export function useRunBatchMutation() {
  const qc = useQueryClient();
  const [done, setDone] = useState(0);
  const mutation = useMutation({
    mutationFn: async (inputs: AnalysisInput[]) => {
      setDone(0);
      const library = await deviceLibrary();
      const out: Array<{ fileName: string; analysis: StoredAnalysis | null; error: unknown }> = [];
      for (const input of inputs) {
        try {
          const a = await analysisRun(input, library, () => undefined);
          await analysisSave(a);
          out.push({ fileName: input.fileName, analysis: a, error: null });
        } catch (error) {
          out.push({ fileName: input.fileName, analysis: null, error });
        }
        setDone((d) => d + 1);
      }
      return out;
    },
    onSuccess: () => void qc.invalidateQueries({ queryKey: analysisKeys.list() }),
  });
  return { ...mutation, done };
}

export function useDeleteAnalysisMutation() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: analysisDelete, onSuccess: () => qc.invalidateQueries({ queryKey: analysisKeys.all }) });
}

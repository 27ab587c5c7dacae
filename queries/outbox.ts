import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { outboxAdd, outboxList } from '../localdb/outbox';
import { newId } from '../client/ids';
import { STALE_TIME_LOCAL_MS } from '../constants/query';
import type { SubmissionCreateInput } from '../shared/api/submissions';
import type { UploadBody } from '../client/sync';

export const outboxKeys = {
  all: ['outbox'] as const,
  list: () => [...outboxKeys.all, 'list'] as const,
};

export function useOutboxQuery() {
  return useQuery({ queryKey: outboxKeys.list(), queryFn: outboxList, staleTime: STALE_TIME_LOCAL_MS });
}

/** Save a submission in the outbox first (works offline); sync sends it. */
export function useSubmitEntryMutation(afterSave: () => void) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (v: { title: string } & ({ kind: 'submission'; body: SubmissionCreateInput } | { kind: 'upload'; body: UploadBody })) => {
      await outboxAdd({ id: newId(), kind: v.kind, title: v.title, body: v.body });
    },
    onSuccess: () => {
      void qc.invalidateQueries({ queryKey: outboxKeys.all });
      afterSave();
    },
  });
}

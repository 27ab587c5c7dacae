import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { outboxAdd, outboxList } from '../localdb/outbox';
import { newId } from '../client/ids';
import { STALE_TIME_LOCAL_MS } from '../constants/query';
import { useSession } from '../components/providers/SessionProvider';
import type { SubmissionCreateInput } from '../shared/api/submissions';
import type { UploadBody } from '../client/sync';

export const outboxKeys = {
  all: ['outbox'] as const,
  list: (userId: string) => [...outboxKeys.all, 'list', userId] as const,
};

/** The signed-in account's outbox on this device. */
export function useOutboxQuery() {
  const userId = useSession().session?.user.id ?? '';
  return useQuery({ queryKey: outboxKeys.list(userId), queryFn: () => outboxList(userId), staleTime: STALE_TIME_LOCAL_MS, enabled: !!userId });
}

/** Save a submission in the outbox first (works offline); sync sends it. */
export function useSubmitEntryMutation(afterSave: () => void) {
  const qc = useQueryClient();
  const userId = useSession().session?.user.id;
  return useMutation({
    mutationFn: async (v: { title: string } & ({ kind: 'submission'; body: SubmissionCreateInput } | { kind: 'upload'; body: UploadBody })) => {
      if (!userId) throw new Error('Sign in to submit.');
      await outboxAdd({ id: newId(), userId, kind: v.kind, title: v.title, body: v.body });
    },
    onSuccess: () => {
      void qc.invalidateQueries({ queryKey: outboxKeys.all });
      afterSave();
    },
  });
}

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { ReviewDetailResponseSchema, ReviewQueueResponseSchema, DecisionResponseSchema, type DecisionBody } from '../shared/api/review';
import { useSession } from '../components/providers/SessionProvider';
import { STALE_TIME_REMOTE_MS } from '../constants/query';

export const reviewKeys = {
  all: ['review'] as const,
  queue: (status: string) => [...reviewKeys.all, 'queue', status] as const,
  detail: (id: string) => [...reviewKeys.all, 'detail', id] as const,
};

/** The curators' queue lives on the server (deciding needs the connection anyway). */
export function useReviewQueueQuery(status: string) {
  const { request } = useSession();
  return useQuery({
    queryKey: reviewKeys.queue(status),
    queryFn: async () => ReviewQueueResponseSchema.parse(await request<unknown>(`/api/review/queue?status=${encodeURIComponent(status)}&limit=100`)),
    staleTime: STALE_TIME_REMOTE_MS,
  });
}

export function useReviewDetailQuery(id: string | null) {
  const { request } = useSession();
  return useQuery({
    queryKey: reviewKeys.detail(id ?? ''),
    enabled: !!id,
    queryFn: async () => ReviewDetailResponseSchema.parse(await request<unknown>(`/api/review/submissions/${encodeURIComponent(id!)}`)),
    staleTime: 0,
  });
}

export function useDecideMutation(id: string) {
  const { request } = useSession();
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (body: DecisionBody) =>
      DecisionResponseSchema.parse(await request<unknown>(`/api/review/submissions/${encodeURIComponent(id)}/decision`, { method: 'POST', body })),
    // A 409 means someone decided first: re-read so the screen shows their decision.
    onSettled: () => qc.invalidateQueries({ queryKey: reviewKeys.all }),
  });
}

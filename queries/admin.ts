import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { AdminUserListResponseSchema, OutboxResponseSchema, type AdminUserPatchBody } from '../shared/api/admin';
import { useSession } from '../components/providers/SessionProvider';
import { STALE_TIME_REMOTE_MS } from '../constants/query';

export const adminKeys = {
  all: ['admin'] as const,
  users: () => [...adminKeys.all, 'users'] as const,
  mail: () => [...adminKeys.all, 'mail'] as const,
};

export function useAdminUsersQuery() {
  const { request } = useSession();
  return useQuery({ queryKey: adminKeys.users(), queryFn: async () => AdminUserListResponseSchema.parse(await request<unknown>('/api/admin/users')), staleTime: STALE_TIME_REMOTE_MS });
}

export function useMailOutboxQuery() {
  const { request } = useSession();
  return useQuery({ queryKey: adminKeys.mail(), queryFn: async () => OutboxResponseSchema.parse(await request<unknown>('/api/admin/outbox?limit=50')), staleTime: 0 });
}

export function usePatchUserMutation() {
  const { request } = useSession();
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, body }: { id: string; body: AdminUserPatchBody }) => request<unknown>(`/api/admin/users/${encodeURIComponent(id)}`, { method: 'PATCH', body }),
    onSettled: () => qc.invalidateQueries({ queryKey: adminKeys.users() }),
  });
}

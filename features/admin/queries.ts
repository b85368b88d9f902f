import { useMutation, useQuery, useQueryClient, type UseMutationResult, type UseQueryResult } from '@tanstack/react-query';
import { z } from 'zod';

import { adminUserListSchema, adminUserSchema, type AdminUser } from '@/shared/schemas';
import { apiRequest } from '@/features/api/client';
import { STALE } from '@/features/api/queryClient';

export const adminKeys = {
  all: ['admin'] as const,
  users: () => [...adminKeys.all, 'users'] as const,
};

const userResponse = z.object({ user: adminUserSchema });

/** Every account on the site (site admins only). */
export function useAdminUsers(enabled: boolean): UseQueryResult<AdminUser[]> {
  return useQuery({
    queryKey: adminKeys.users(),
    queryFn: async ({ signal }) => (await apiRequest('/admin/users', adminUserListSchema, { signal })).users,
    enabled,
    staleTime: STALE.SECONDS.THIRTY,
  });
}

export type DisabledChange = { userId: number; disabled: boolean };

export function useSetUserDisabled(): UseMutationResult<AdminUser, Error, DisabledChange> {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ userId, disabled }) =>
      (await apiRequest(`/admin/users/${userId}`, userResponse, { method: 'PATCH', body: { disabled } })).user,
    onSuccess: (user) =>
      queryClient.setQueryData<AdminUser[]>(adminKeys.users(), (users) => users?.map((row) => (row.id === user.id ? user : row))),
  });
}

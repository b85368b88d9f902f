import { useMutation, useQueryClient, type UseMutationResult } from '@tanstack/react-query';

import { meResponseSchema, messageResponseSchema, type ChangePasswordBody, type UpdateAccountBody, type User } from '@/shared/schemas';
import { apiRequest } from '@/features/api/client';
import { authKeys } from '@/features/auth/queries';

/** Name and area unit; the answer replaces the signed-in person in the cache. */
export function useUpdateAccount(): UseMutationResult<User, Error, UpdateAccountBody> {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body) => (await apiRequest('/account', meResponseSchema, { method: 'PATCH', body })).user,
    onSuccess: (user) => queryClient.setQueryData(authKeys.me(), user),
  });
}

export function useChangePassword(): UseMutationResult<{ message: string }, Error, ChangePasswordBody> {
  return useMutation({
    mutationFn: (body) => apiRequest('/account/password', messageResponseSchema, { method: 'POST', body }),
  });
}

import {
  useMutation,
  useQuery,
  useQueryClient,
  type QueryClient,
  type UseMutationResult,
  type UseQueryResult,
} from '@tanstack/react-query';

import {
  meResponseSchema,
  messageResponseSchema,
  type ForgotBody,
  type ResetBody,
  type SignInBody,
  type SignUpBody,
  type User,
} from '@/shared/schemas';
import { isApiError } from '@/features/api/ApiError';
import { apiRequest, apiSend, forgetCsrfToken } from '@/features/api/client';
import { STALE } from '@/features/api/queryClient';
import { useUiStore } from '@/features/ui/store';

export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
};

type Message = { message: string };

/** The signed-in person, or null when the session is anonymous (401). */
export function useMe(): UseQueryResult<User | null> {
  return useQuery({
    queryKey: authKeys.me(),
    queryFn: async ({ signal }) => {
      try {
        return (await apiRequest('/auth/me', meResponseSchema, { signal })).user;
      } catch (error) {
        if (isApiError(error, 401)) return null;
        throw error;
      }
    },
    staleTime: STALE.MINUTES.FIVE,
  });
}

/** A request answered 401: the session is gone, so the signed-in layout sends the person to sign in. */
export function markSignedOut(queryClient: QueryClient): void {
  if (queryClient.getQueryData(authKeys.me()) !== null) queryClient.setQueryData(authKeys.me(), null);
}

/** Replaces the session: new CSRF token, no data of the previous person, `me` set to `user`. */
function useSwitchSession(): (user: User | null) => void {
  const queryClient = useQueryClient();
  const resetUi = useUiStore((state) => state.reset);
  return (user) => {
    forgetCsrfToken();
    queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.all[0] });
    if (user === null) resetUi();
    queryClient.setQueryData(authKeys.me(), user);
  };
}

export function useSignIn(): UseMutationResult<User, Error, SignInBody> {
  const switchSession = useSwitchSession();
  return useMutation({
    mutationFn: async (body) => (await apiRequest('/auth/sign-in', meResponseSchema, { method: 'POST', body })).user,
    onSuccess: switchSession,
  });
}

export function useSignOut(): UseMutationResult<void, Error, void> {
  const switchSession = useSwitchSession();
  return useMutation({
    mutationFn: () => apiSend('/auth/sign-out', { method: 'POST' }),
    onSuccess: () => switchSession(null),
  });
}

function useMessageMutation<B>(path: string): UseMutationResult<Message, Error, B> {
  return useMutation({ mutationFn: (body: B) => apiRequest(path, messageResponseSchema, { method: 'POST', body }) });
}

export const useSignUp = (): UseMutationResult<Message, Error, SignUpBody> => useMessageMutation('/auth/sign-up');
export const useVerifyEmail = (): UseMutationResult<Message, Error, { token: string }> => useMessageMutation('/auth/verify');
export const useResendVerification = (): UseMutationResult<Message, Error, { email: string }> =>
  useMessageMutation('/auth/verify/resend');
export const useForgotPassword = (): UseMutationResult<Message, Error, ForgotBody> => useMessageMutation('/auth/forgot');
export const useResetPassword = (): UseMutationResult<Message, Error, ResetBody> => useMessageMutation('/auth/reset');

import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ChangePasswordInput, RequestPasswordResetInput, TokenPasswordInput } from '@shared/schemas/auth.ts';
import type { SessionUser } from '@shared/schemas/user.ts';
import { api, type ApiData } from '@/lib/api-client.ts';
import { meQueryOptions } from './get-me.ts';

export const useChangePassword = () =>
  useMutation({ mutationFn: (input: ChangePasswordInput) => api.post<void>('/auth/password', input) });

export const useRequestPasswordReset = () =>
  useMutation({
    mutationFn: (input: RequestPasswordResetInput) => api.post<ApiData<{ message: string }>>('/auth/password-reset', input),
  });

/** Accepting an invitation and completing a reset both set a password from an e-mailed token and sign in. */
export function useCompleteWithToken(kind: 'invitation' | 'reset') {
  const queryClient = useQueryClient();
  const url = kind === 'invitation' ? '/auth/invitation/accept' : '/auth/password-reset/complete';
  return useMutation({
    mutationFn: async (input: TokenPasswordInput) => (await api.post<ApiData<SessionUser>>(url, input)).data,
    onSuccess: (user) => {
      queryClient.clear();
      queryClient.setQueryData(meQueryOptions().queryKey, user);
    },
  });
}

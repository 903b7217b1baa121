import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SignInInput } from '@shared/schemas/auth.ts';
import type { SessionUser } from '@shared/schemas/user.ts';
import { api, type ApiData } from '@/lib/api-client.ts';
import { meQueryOptions } from './get-me.ts';

export const signIn = async (input: SignInInput) => (await api.post<ApiData<SessionUser>>('/auth/sign-in', input)).data;

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (user) => {
      // A new person: drop everything cached for the previous one.
      queryClient.clear();
      queryClient.setQueryData(meQueryOptions().queryKey, user);
    },
  });
}

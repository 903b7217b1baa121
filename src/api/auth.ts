/** The session: who is signed in, signing in and out, passwords, invitations. */
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  ChangePasswordInput,
  RequestPasswordResetInput,
  SignInInput,
  TokenPasswordInput,
  TokenState,
} from '@shared/schemas/auth.ts';
import type { SessionUser } from '@shared/schemas/user.ts';
import { api, ApiRequestError, type ApiData } from '@/lib/api-client.ts';

/** Every query key for the session, written once. */
export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
  invitation: (token: string) => [...authKeys.all, 'invitation', token] as const,
};

/** The signed-in user, or null when nobody is signed in. */
export async function getMe(): Promise<SessionUser | null> {
  try {
    return (await api.get<ApiData<SessionUser>>('/auth/me')).data;
  } catch (error) {
    if (error instanceof ApiRequestError && error.status === 401) return null;
    throw error;
  }
}

export const meQueryOptions = () => queryOptions({ queryKey: authKeys.me(), queryFn: getMe, staleTime: 5 * 60_000 });

/** The signed-in user (null when nobody is). */
export const useMe = () => useQuery(meQueryOptions());

/** A new person (or nobody): drop everything cached for the previous one. */
function useStartSession() {
  const queryClient = useQueryClient();
  return (user: SessionUser | null) => {
    queryClient.clear();
    queryClient.setQueryData(authKeys.me(), user);
  };
}

/** Signs in with e-mail and password. */
export function useSignIn() {
  const start = useStartSession();
  return useMutation({
    mutationFn: async (input: SignInInput) => (await api.post<ApiData<SessionUser>>('/auth/sign-in', input)).data,
    onSuccess: start,
  });
}

/** Signs out. */
export function useSignOut() {
  const start = useStartSession();
  return useMutation({ mutationFn: () => api.post<void>('/auth/sign-out'), onSuccess: () => start(null) });
}

/** Changes the signed-in person's password. */
export const useChangePassword = () =>
  useMutation({ mutationFn: (input: ChangePasswordInput) => api.post<void>('/auth/password', input) });

/** Asks for a password-reset e-mail. */
export const useRequestPasswordReset = () =>
  useMutation({
    mutationFn: (input: RequestPasswordResetInput) => api.post<ApiData<{ message: string }>>('/auth/password-reset', input),
  });

/** Accepting an invitation and completing a reset both set a password from an e-mailed token and sign in. */
export function useCompleteWithToken(kind: 'invitation' | 'reset') {
  const start = useStartSession();
  const url = kind === 'invitation' ? '/auth/invitation/accept' : '/auth/password-reset/complete';
  return useMutation({
    mutationFn: async (input: TokenPasswordInput) => (await api.post<ApiData<SessionUser>>(url, input)).data,
    onSuccess: start,
  });
}

/** Whether an invitation link still works (valid, used, expired or invalid), asked once when the page opens; never uses it. */
export const useInvitationCheck = (token: string | null) =>
  useQuery({
    queryKey: authKeys.invitation(token ?? ''),
    enabled: !!token,
    queryFn: async () => (await api.post<ApiData<{ state: TokenState }>>('/auth/invitation/check', { token })).data.state,
    staleTime: Number.POSITIVE_INFINITY,
    retry: false,
  });

import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SessionUser } from '@shared/schemas/user.ts';
import { api, ApiRequestError, type ApiData } from '@/lib/api-client.ts';

/** The signed-in user, or null when nobody is signed in. */
export async function getMe(): Promise<SessionUser | null> {
  try {
    return (await api.get<ApiData<SessionUser>>('/auth/me')).data;
  } catch (error) {
    if (error instanceof ApiRequestError && error.status === 401) return null;
    throw error;
  }
}

export const meQueryOptions = () => queryOptions({ queryKey: ['auth', 'me'], queryFn: getMe, staleTime: 5 * 60_000 });

export const useMe = () => useQuery(meQueryOptions());

/** Staff accounts: the list, inviting, changing a role or status, sending an invitation again. */
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { UserDto, UserInviteInput, UserUpdateInput } from '@shared/schemas/user.ts';
import { api, type ApiData } from '@/lib/api-client.ts';

/** Every query key for staff accounts, written once. */
export const userKeys = {
  all: ['users'] as const,
  list: () => [...userKeys.all, 'list'] as const,
};

export const usersQueryOptions = () =>
  queryOptions({ queryKey: userKeys.list(), queryFn: async () => (await api.get<ApiData<UserDto[]>>('/users')).data });

/** Every staff account. */
export const useUsers = () => useQuery(usersQueryOptions());

/** Invites a person by e-mail. */
export function useInviteUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: UserInviteInput) => (await api.post<ApiData<UserDto>>('/users', input)).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.all }),
  });
}

/** Changes a person's name or role, or turns the account on or off. */
export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, ...input }: UserUpdateInput & { id: string }) =>
      (await api.patch<ApiData<UserDto>>(`/users/${id}`, input)).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.all }),
  });
}

/** Sends an invitation again. */
export const useResendInvitation = () =>
  useMutation({ mutationFn: (id: string) => api.post<ApiData<{ message: string }>>(`/users/${id}/invitation`) });

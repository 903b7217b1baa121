import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { UserDto, UserInviteInput, UserUpdateInput } from '@shared/schemas/user.ts';
import { api, type ApiData } from '@/lib/api-client.ts';

export const usersQueryOptions = () =>
  queryOptions({ queryKey: ['users'], queryFn: async () => (await api.get<ApiData<UserDto[]>>('/users')).data });

export const useUsers = () => useQuery(usersQueryOptions());

export function useInviteUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: UserInviteInput) => (await api.post<ApiData<UserDto>>('/users', input)).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersQueryOptions().queryKey }),
  });
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, ...input }: UserUpdateInput & { id: string }) =>
      (await api.patch<ApiData<UserDto>>(`/users/${id}`, input)).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersQueryOptions().queryKey }),
  });
}

export const useResendInvitation = () =>
  useMutation({ mutationFn: (id: string) => api.post<ApiData<{ message: string }>>(`/users/${id}/invitation`) });

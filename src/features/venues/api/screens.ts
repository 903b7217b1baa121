import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { KioskScreenDto, PairingCodeDto, ScreenCreateInput } from '@shared/schemas/kiosk.ts';
import { api, type ApiData } from '@/lib/api-client.ts';

export const screensQueryOptions = (venueId: string) =>
  queryOptions({
    queryKey: ['venues', venueId, 'screens'],
    queryFn: async () => (await api.get<ApiData<KioskScreenDto[]>>(`/venues/${venueId}/screens`)).data,
    // Health changes on its own as screens report in or fall silent.
    refetchInterval: 30_000,
  });

export const useScreens = (venueId: string) => useQuery(screensQueryOptions(venueId));

function useScreenMutation<T, V>(venueId: string, fn: (vars: V) => Promise<T>) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: fn, onSuccess: () => queryClient.invalidateQueries({ queryKey: ['venues', venueId] }) });
}

export const useAddScreen = (venueId: string) =>
  useScreenMutation(
    venueId,
    async (input: ScreenCreateInput) => (await api.post<ApiData<PairingCodeDto>>(`/venues/${venueId}/screens`, input)).data,
  );

export const useRepairScreen = (venueId: string) =>
  useScreenMutation(
    venueId,
    async (screenId: string) => (await api.post<ApiData<PairingCodeDto>>(`/venues/${venueId}/screens/${screenId}/pairing`)).data,
  );

export const useRevokeScreen = (venueId: string) =>
  useScreenMutation(
    venueId,
    async (screenId: string) => (await api.post<ApiData<KioskScreenDto>>(`/venues/${venueId}/screens/${screenId}/revoke`)).data,
  );

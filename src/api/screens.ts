/** A venue's kiosk screens: the list with their health, adding, re-pairing and revoking one. */
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { KioskScreenDto, PairingCodeDto, ScreenCreateInput, ScreenUpdateInput } from '@shared/schemas/kiosk.ts';
import { api, type ApiData } from '@/lib/api-client.ts';
import { venueKeys } from './venues.ts';

export const screensQueryOptions = (venueId: string) =>
  queryOptions({
    queryKey: venueKeys.screens(venueId),
    queryFn: async () => (await api.get<ApiData<KioskScreenDto[]>>(`/venues/${venueId}/screens`)).data,
    // Health changes on its own as screens report in or fall silent.
    refetchInterval: 30_000,
  });

/** The venue's screens, refreshed every 30 seconds. */
export const useScreens = (venueId: string) => useQuery(screensQueryOptions(venueId));

function useScreenMutation<T, V>(venueId: string, fn: (vars: V) => Promise<T>) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: fn, onSuccess: () => queryClient.invalidateQueries({ queryKey: venueKeys.detail(venueId) }) });
}

/** Adds a screen; the answer is its pairing code. */
export const useAddScreen = (venueId: string) =>
  useScreenMutation(
    venueId,
    async (input: ScreenCreateInput) => (await api.post<ApiData<PairingCodeDto>>(`/venues/${venueId}/screens`, input)).data,
  );

/** Gives a screen a new pairing code. */
export const useRepairScreen = (venueId: string) =>
  useScreenMutation(
    venueId,
    async (screenId: string) => (await api.post<ApiData<PairingCodeDto>>(`/venues/${venueId}/screens/${screenId}/pairing`)).data,
  );

/** Sets how a screen hangs (auto, landscape, portrait); its player follows at its next heartbeat. */
export const useSetScreenOrientation = (venueId: string) =>
  useScreenMutation(
    venueId,
    async ({ screenId, ...input }: ScreenUpdateInput & { screenId: string }) =>
      (await api.patch<ApiData<KioskScreenDto>>(`/venues/${venueId}/screens/${screenId}`, input)).data,
  );

/** Stops a screen from showing anything. */
export const useRevokeScreen = (venueId: string) =>
  useScreenMutation(
    venueId,
    async (screenId: string) => (await api.post<ApiData<KioskScreenDto>>(`/venues/${venueId}/screens/${screenId}/revoke`)).data,
  );

/** Gives a screen one language to play, or none (null) to follow its channel's languages. */
export const useSetScreenLanguage = (venueId: string) =>
  useScreenMutation(
    venueId,
    async (input: { screenId: string; language: string | null }) =>
      (await api.patch<ApiData<KioskScreenDto>>(`/venues/${venueId}/screens/${input.screenId}`, { language: input.language }))
        .data,
  );

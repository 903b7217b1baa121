/**
 * Venues: the list, one venue, the choices every member of staff can read (the venue a statement is
 * for), and managing them. A venue's screens and sky live under its key (`venueKeys.detail`), so a
 * change to the venue refreshes them too.
 */
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { VenueChoiceDto, VenueCreateInput, VenueDto } from '@shared/schemas/venue.ts';
import { api, type ApiData } from '@/lib/api-client.ts';

/** Every query key for venues and what hangs off one (screens, sky), written once. */
export const venueKeys = {
  all: ['venues'] as const,
  list: () => [...venueKeys.all, 'list'] as const,
  choices: () => [...venueKeys.all, 'choices'] as const,
  detail: (id: string) => [...venueKeys.all, 'detail', id] as const,
  screens: (id: string) => [...venueKeys.detail(id), 'screens'] as const,
  sky: (id: string, date?: string, at?: string) => [...venueKeys.detail(id), 'sky', date ?? 'tonight', at ?? 'dusk'] as const,
};

export const venuesQueryOptions = () =>
  queryOptions({ queryKey: venueKeys.list(), queryFn: async () => (await api.get<ApiData<VenueDto[]>>('/venues')).data });

/** Every venue (managers). */
export const useVenues = () => useQuery(venuesQueryOptions());

export const venueQueryOptions = (id: string) =>
  queryOptions({ queryKey: venueKeys.detail(id), queryFn: async () => (await api.get<ApiData<VenueDto>>(`/venues/${id}`)).data });

/** One venue. */
export const useVenue = (id: string) => useQuery(venueQueryOptions(id));

export const venueChoicesQueryOptions = () =>
  queryOptions({
    queryKey: venueKeys.choices(),
    queryFn: async () => (await api.get<ApiData<VenueChoiceDto[]>>('/venues/choices')).data,
  });

/** The venues to choose from, by name; loaded only when `enabled` (a template that needs one is chosen). */
export const useVenueChoices = (enabled = true) => useQuery({ ...venueChoicesQueryOptions(), enabled });

/** Every venue query: a venue's change reaches the list, the choices, its screens and its sky (a move recomputes it). */
function useRefreshVenues() {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: venueKeys.all });
}

/** Adds a venue. */
export function useCreateVenue() {
  const refresh = useRefreshVenues();
  return useMutation({
    mutationFn: async (input: VenueCreateInput) => (await api.post<ApiData<VenueDto>>('/venues', input)).data,
    onSuccess: refresh,
  });
}

/** Renames or moves a venue. */
export function useUpdateVenue(id: string) {
  const refresh = useRefreshVenues();
  return useMutation({
    mutationFn: async (input: Partial<VenueCreateInput>) => (await api.patch<ApiData<VenueDto>>(`/venues/${id}`, input)).data,
    onSuccess: refresh,
  });
}

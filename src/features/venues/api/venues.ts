import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { VenueCreateInput, VenueDto } from '@shared/schemas/venue.ts';
import { api, type ApiData } from '@/lib/api-client.ts';

export const venuesQueryOptions = () =>
  queryOptions({ queryKey: ['venues'], queryFn: async () => (await api.get<ApiData<VenueDto[]>>('/venues')).data });

export const venueQueryOptions = (id: string) =>
  queryOptions({ queryKey: ['venues', id], queryFn: async () => (await api.get<ApiData<VenueDto>>(`/venues/${id}`)).data });

export const useVenues = () => useQuery(venuesQueryOptions());
export const useVenue = (id: string) => useQuery(venueQueryOptions(id));

export function useCreateVenue() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: VenueCreateInput) => (await api.post<ApiData<VenueDto>>('/venues', input)).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: venuesQueryOptions().queryKey }),
  });
}

export function useUpdateVenue(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: Partial<VenueCreateInput>) => (await api.patch<ApiData<VenueDto>>(`/venues/${id}`, input)).data,
    // The venue, the list and its sky (which a move recomputes) all change.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: venuesQueryOptions().queryKey }),
  });
}

export function useDeleteVenue() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => api.delete<void>(`/venues/${id}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: venuesQueryOptions().queryKey }),
  });
}

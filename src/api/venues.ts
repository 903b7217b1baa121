/**
 * Venues as choices in a list (id, name, time zone), readable by every member of staff: the venue a
 * statement is for. Managing venues is the venues feature's own API.
 */
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { VenueChoiceDto } from '@shared/schemas/venue.ts';
import { api, type ApiData } from '@/lib/api-client.ts';

/** The query for venue choices; under ['venues'], so the venues feature's changes (create, rename, delete) refresh it too. */
export const venueChoicesQueryOptions = () =>
  queryOptions({
    queryKey: ['venues', 'choices'],
    queryFn: async () => (await api.get<ApiData<VenueChoiceDto[]>>('/venues/choices')).data,
  });

/** The venues to choose from, by name; loaded only when `enabled` (a template that needs one is chosen). */
export const useVenueChoices = (enabled = true) => useQuery({ ...venueChoicesQueryOptions(), enabled });

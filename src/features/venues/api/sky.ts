import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SkySnapshotDto } from '@shared/schemas/kiosk.ts';
import { api, type ApiData } from '@/lib/api-client.ts';

/** The venue's sky for a night (today's by default), optionally at a chosen clock time. */
export const skyQueryOptions = (venueId: string, date?: string, at?: string) => {
  const params = new URLSearchParams();
  if (date) params.set('date', date);
  if (at) params.set('at', at);
  const query = params.toString();
  return queryOptions({
    queryKey: ['venues', venueId, 'sky', date ?? 'tonight', at ?? 'dusk'],
    queryFn: async () => (await api.get<ApiData<SkySnapshotDto>>(`/venues/${venueId}/sky${query ? `?${query}` : ''}`)).data,
  });
};

export const useSky = (venueId: string, date?: string, at?: string) => useQuery(skyQueryOptions(venueId, date, at));

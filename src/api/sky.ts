/** A venue's sky for a night. */
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SkySnapshotDto } from '@shared/schemas/kiosk.ts';
import { api, type ApiData } from '@/lib/api-client.ts';
import { queryString } from '@/lib/query-string.ts';
import { venueKeys } from './venues.ts';

/** The venue's sky for a night (today's by default), optionally at a chosen clock time. */
export const skyQueryOptions = (venueId: string, date?: string, at?: string) =>
  queryOptions({
    queryKey: venueKeys.sky(venueId, date, at),
    queryFn: async () => (await api.get<ApiData<SkySnapshotDto>>(`/venues/${venueId}/sky${queryString({ date, at })}`)).data,
  });

/** The venue's sky; see `skyQueryOptions`. */
export const useSky = (venueId: string, date?: string, at?: string) => useQuery(skyQueryOptions(venueId, date, at));

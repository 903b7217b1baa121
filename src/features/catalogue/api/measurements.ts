import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  MeasurementDto,
  MeasurementHistoryDto,
  MeasurementInput,
  MeasurementReviewInput,
} from '@shared/schemas/measurement.ts';
import { api, type ApiData } from '@/lib/api-client.ts';

export const measurementsQueryOptions = (objectId: string) =>
  queryOptions({
    queryKey: ['catalogue', 'object', objectId, 'measurements'],
    queryFn: async () => (await api.get<ApiData<MeasurementDto[]>>(`/catalogue/objects/${objectId}/measurements`)).data,
  });

export const useMeasurements = (objectId: string) => useQuery(measurementsQueryOptions(objectId));

export const historyQueryOptions = (objectId: string) =>
  queryOptions({
    queryKey: ['catalogue', 'object', objectId, 'history'],
    queryFn: async () => (await api.get<ApiData<MeasurementHistoryDto[]>>(`/catalogue/objects/${objectId}/history`)).data,
  });

export const useMeasurementHistory = (objectId: string) => useQuery(historyQueryOptions(objectId));

/** After any change, the object's measurements, its history and the table's counts are stale. */
function useRefresh(objectId: string) {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: ['catalogue', 'object', objectId] }),
      queryClient.invalidateQueries({ queryKey: ['catalogue', 'objects'] }),
    ]);
}

export function useAddMeasurement(objectId: string) {
  const refresh = useRefresh(objectId);
  return useMutation({
    mutationFn: async (input: MeasurementInput) =>
      (await api.post<ApiData<MeasurementDto>>(`/catalogue/objects/${objectId}/measurements`, input)).data,
    onSuccess: refresh,
  });
}

export function useUpdateMeasurement(objectId: string) {
  const refresh = useRefresh(objectId);
  return useMutation({
    mutationFn: async ({ id, ...input }: MeasurementInput & { id: string; reason?: string }) =>
      (await api.patch<ApiData<MeasurementDto>>(`/catalogue/measurements/${id}`, input)).data,
    onSuccess: refresh,
  });
}

export function useSetPreferred(objectId: string) {
  const refresh = useRefresh(objectId);
  return useMutation({
    mutationFn: async ({ id, preferred, replaces }: { id: string; preferred: boolean; replaces: string | null }) =>
      (await api.put<ApiData<MeasurementDto>>(`/catalogue/measurements/${id}/preferred`, { preferred, replaces })).data,
    // A refused choice (another reviewer got there first) also means the page is out of date.
    onSettled: refresh,
  });
}

export function useReviewMeasurement(objectId: string) {
  const refresh = useRefresh(objectId);
  return useMutation({
    mutationFn: async ({ id, ...input }: MeasurementReviewInput & { id: string }) =>
      (await api.post<ApiData<MeasurementDto>>(`/catalogue/measurements/${id}/review`, input)).data,
    onSettled: refresh,
  });
}

export function useRetireMeasurement(objectId: string) {
  const refresh = useRefresh(objectId);
  return useMutation({
    mutationFn: async ({ id, reason }: { id: string; reason: string }) =>
      (await api.delete<ApiData<MeasurementDto>>(`/catalogue/measurements/${id}?reason=${encodeURIComponent(reason)}`)).data,
    onSettled: refresh,
  });
}

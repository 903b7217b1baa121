/** An object's measurements and their history: adding, editing, choosing the preferred one, review, retiring. */
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  MeasurementConfirmationDto,
  MeasurementDto,
  MeasurementHistoryDto,
  MeasurementInput,
  MeasurementReviewInput,
} from '@shared/schemas/measurement.ts';
import { api, ApiRequestError, type ApiData } from '@/lib/api-client.ts';
import { queryString } from '@/lib/query-string.ts';
import { catalogueKeys } from './catalogue-objects.ts';

export const measurementsQueryOptions = (objectId: string) =>
  queryOptions({
    queryKey: catalogueKeys.measurements(objectId),
    queryFn: async () => (await api.get<ApiData<MeasurementDto[]>>(`/catalogue/objects/${objectId}/measurements`)).data,
  });

/** The object's measurements. */
export const useMeasurements = (objectId: string) => useQuery(measurementsQueryOptions(objectId));

export const historyQueryOptions = (objectId: string) =>
  queryOptions({
    queryKey: catalogueKeys.history(objectId),
    queryFn: async () => (await api.get<ApiData<MeasurementHistoryDto[]>>(`/catalogue/objects/${objectId}/history`)).data,
  });

/** What happened to the object's measurements, newest first. */
export const useMeasurementHistory = (objectId: string) => useQuery(historyQueryOptions(objectId));

/** After any change, the object's measurements, its history and the table's counts are stale. */
function useRefresh(objectId: string) {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: catalogueKeys.object(objectId) }),
      queryClient.invalidateQueries({ queryKey: catalogueKeys.objectLists() }),
    ]);
}

/** Adds a measurement to the object. */
export function useAddMeasurement(objectId: string) {
  const refresh = useRefresh(objectId);
  return useMutation({
    mutationFn: async (input: MeasurementInput) =>
      (await api.post<ApiData<MeasurementDto>>(`/catalogue/objects/${objectId}/measurements`, input)).data,
    onSuccess: refresh,
  });
}

/**
 * What the server asks to be confirmed before it stores a value or a preferred choice (a 409
 * `confirmation_needed`): its warnings and the statements at stake; null for any other error.
 */
export function confirmationOf(error: unknown): MeasurementConfirmationDto | null {
  if (!(error instanceof ApiRequestError) || error.code !== 'confirmation_needed') return null;
  const current = error.current as Partial<MeasurementConfirmationDto> | undefined;
  if (!Array.isArray(current?.warnings)) return null;
  return { warnings: current.warnings, statements: Array.isArray(current.statements) ? current.statements : [] };
}

/** Chooses (or stops choosing) a measurement as the one statements use; `confirm` after reading its warnings. */
export function useSetPreferred(objectId: string) {
  const refresh = useRefresh(objectId);
  return useMutation({
    mutationFn: async ({ id, ...input }: { id: string; preferred: boolean; replaces: string | null; confirm?: boolean }) =>
      (await api.put<ApiData<MeasurementDto>>(`/catalogue/measurements/${id}/preferred`, input)).data,
    // A refused choice (another reviewer got there first) also means the page is out of date.
    onSettled: refresh,
  });
}

/** Accepts or declines a measurement waiting for review. */
export function useReviewMeasurement(objectId: string) {
  const refresh = useRefresh(objectId);
  return useMutation({
    mutationFn: async ({ id, ...input }: MeasurementReviewInput & { id: string }) =>
      (await api.post<ApiData<MeasurementDto>>(`/catalogue/measurements/${id}/review`, input)).data,
    onSettled: refresh,
  });
}

/** Retires a measurement with a reason; it stays in the history. */
export function useRetireMeasurement(objectId: string) {
  const refresh = useRefresh(objectId);
  return useMutation({
    mutationFn: async ({ id, reason }: { id: string; reason: string }) =>
      (await api.delete<ApiData<MeasurementDto>>(`/catalogue/measurements/${id}${queryString({ reason })}`)).data,
    onSettled: refresh,
  });
}

/** The organisation's settings and its adopted cosmology (previewing and changing it). */
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { CalcModel } from '@shared/schemas/calc.ts';
import type { PreviewRow, SettingsDto, SettingsUpdateInput } from '@shared/schemas/settings.ts';
import { api, type ApiData } from '@/lib/api-client.ts';
import { statementKeys } from './statements.ts';

/** Every query key for settings, written once. */
export const settingsKeys = {
  all: ['settings'] as const,
  current: () => [...settingsKeys.all, 'current'] as const,
};

export const settingsQueryOptions = () =>
  queryOptions({
    queryKey: settingsKeys.current(),
    queryFn: async () => (await api.get<ApiData<SettingsDto>>('/settings')).data,
  });

/** The organisation's settings. */
export const useSettings = () => useQuery(settingsQueryOptions());

/** What a change of cosmology would do to the statements, before it is made. */
export interface CosmologyPreview {
  rows: PreviewRow[];
  checked: number;
  version: number;
  proposedLabel: string;
}

/** Previews a change of cosmology (nothing is changed). */
export const usePreviewCosmology = () =>
  useMutation({
    mutationFn: async (model: CalcModel) =>
      (await api.post<ApiData<CosmologyPreview>>('/settings/cosmology/preview', { model })).data,
  });

/** Adopts a cosmology, from the settings version on screen; every statement is worked out again. */
export function useChangeCosmology() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: { model: CalcModel; expectedVersion: number }) =>
      (await api.put<ApiData<SettingsDto>>('/settings/cosmology', input)).data,
    onSuccess: (settings) => {
      queryClient.setQueryData(settingsKeys.current(), settings);
      void queryClient.invalidateQueries({ queryKey: statementKeys.all });
    },
  });
}

/** Changes the other settings. */
export function useUpdateSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: SettingsUpdateInput) => (await api.patch<ApiData<SettingsDto>>('/settings', input)).data,
    onSuccess: (settings) => queryClient.setQueryData(settingsKeys.current(), settings),
  });
}

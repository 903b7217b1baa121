import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { CalcModel } from '@shared/schemas/calc.ts';
import type { PreviewRow, SettingsDto, SettingsUpdateInput } from '@shared/schemas/settings.ts';
import { api, type ApiData } from '@/lib/api-client.ts';

export const settingsQueryOptions = () =>
  queryOptions({ queryKey: ['settings'], queryFn: async () => (await api.get<ApiData<SettingsDto>>('/settings')).data });

export const useSettings = () => useQuery(settingsQueryOptions());

export interface CosmologyPreview {
  rows: PreviewRow[];
  checked: number;
  version: number;
  proposedLabel: string;
}

export const usePreviewCosmology = () =>
  useMutation({
    mutationFn: async (model: CalcModel) =>
      (await api.post<ApiData<CosmologyPreview>>('/settings/cosmology/preview', { model })).data,
  });

export function useChangeCosmology() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: { model: CalcModel; expectedVersion: number }) =>
      (await api.put<ApiData<SettingsDto>>('/settings/cosmology', input)).data,
    onSuccess: (settings) => {
      queryClient.setQueryData(settingsQueryOptions().queryKey, settings);
      void queryClient.invalidateQueries({ queryKey: ['statements'] });
    },
  });
}

export function useUpdateSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: SettingsUpdateInput) => (await api.patch<ApiData<SettingsDto>>('/settings', input)).data,
    onSuccess: (settings) => queryClient.setQueryData(settingsQueryOptions().queryKey, settings),
  });
}

/** Catalogue imports from CSV: a dry run of a file, then committing it. */
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ImportDto, ImportMapping } from '@shared/schemas/catalogue-import.ts';
import type { ApiError } from '@shared/schemas/common.ts';
import { api, ApiRequestError, errorFromAnswer, type ApiData } from '@/lib/api-client.ts';
import { catalogueKeys } from './catalogue-objects.ts';

/**
 * Sends a file for a dry run. The shared client speaks JSON only, so this one call builds its own
 * multipart request; errors come back in the same ApiRequestError shape.
 */
async function uploadForDryRun(file: File, mapping?: ImportMapping): Promise<ImportDto> {
  const form = new FormData();
  form.append('file', file);
  if (mapping) form.append('mapping', JSON.stringify(mapping));
  let response: Response;
  try {
    response = await fetch('/api/catalogue/imports', {
      method: 'POST',
      body: form,
      credentials: 'same-origin',
      headers: { Accept: 'application/json' },
    });
  } catch {
    throw new ApiRequestError(0, 'network_error', 'Starproof cannot be reached. Check the connection; nothing was imported.');
  }
  const payload = (await response.json().catch(() => undefined)) as (ApiError & ApiData<ImportDto>) | undefined;
  if (!response.ok || !payload?.data) throw errorFromAnswer(response.status, payload);
  return payload.data;
}

/** Checks a CSV file without changing the catalogue. */
export const useDryRunImport = () =>
  useMutation({ mutationFn: ({ file, mapping }: { file: File; mapping?: ImportMapping }) => uploadForDryRun(file, mapping) });

/**
 * Imports every accepted row of a checked file, in one transaction; `confirm` once the rows the dry
 * run asked to confirm have been read. A second commit of the same import answers the first one's result.
 */
export function useCommitImport() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, confirm }: { id: string; confirm: boolean }) =>
      (await api.post<ApiData<ImportDto>>(`/catalogue/imports/${id}/commit`, { confirm })).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.all }),
  });
}

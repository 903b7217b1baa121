/** A page's history: its revisions, the difference between two, and restoring an old one. */
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PageDto, PageRevisionDto, RevisionDiffDto } from '@shared/schemas/page.ts';
import { api, type ApiData } from '@/lib/api-client.ts';
import { queryString } from '@/lib/query-string.ts';
import { pageKeys, usePageChange } from './pages.ts';

export const revisionsQueryOptions = (id: string) =>
  queryOptions({
    queryKey: pageKeys.revisions(id),
    queryFn: async () => (await api.get<ApiData<PageRevisionDto[]>>(`/pages/${id}/revisions`)).data,
  });

/** Every revision of the page, newest first. */
export const useRevisions = (id: string) => useQuery(revisionsQueryOptions(id));

export const revisionDiffQueryOptions = (id: string, from?: number, to?: number) =>
  queryOptions({
    queryKey: pageKeys.diff(id, from, to),
    queryFn: async () =>
      (await api.get<ApiData<RevisionDiffDto>>(`/pages/${id}/revisions/diff${queryString({ from, to })}`)).data,
  });

/** What changed between two revisions; asks only when two different ones are chosen. */
export const useRevisionDiff = (id: string, from?: number, to?: number) =>
  useQuery({ ...revisionDiffQueryOptions(id, from, to), enabled: !!from && !!to && from !== to });

/** Restores an old revision as a new one, from the version on screen (a stale one answers 409). */
export const useRestoreRevision = (id: string) =>
  usePageChange(id, (input: { number: number; version: number }) =>
    api.post<ApiData<PageDto>>(`/pages/${id}/revisions/${input.number}/restore`, { version: input.version }),
  );

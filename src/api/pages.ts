/**
 * Pages: the list, one page, the dashboard, the renderings a reviewer reads, creating and saving.
 * Every page query lives under `pageKeys`; revisions, comments and workflow steps have their own
 * modules beside this one and use the same keys.
 */
import { hashKey, keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  PageServerVersionSchema,
  type DashboardDto,
  type PageCreateInput,
  type PageDto,
  type PageRow,
  type PageServerVersion,
  type PageStatus,
} from '@shared/schemas/page.ts';
import { api, ApiRequestError, type ApiData } from '@/lib/api-client.ts';
import { queryString } from '@/lib/query-string.ts';
import { statementKeys } from './statements.ts';

/** What the page list can be narrowed by. */
export interface PageFilters {
  status?: PageStatus;
  objectId?: string;
  writerId?: string;
  q?: string;
  /** Archived pages are hidden unless asked for: `include` lists them with the rest, `only` alone. */
  archived?: 'include' | 'only';
  page?: number;
}

type PageList = { data: PageRow[]; meta: { total: number; page: number; pageSize: number } };

/** A page as the reviewer and the public see it, rendered. */
export interface RenderedPage {
  title: string;
  html: string;
  revisionNumber: number;
}

/** Every query key for pages, written once. */
export const pageKeys = {
  all: ['pages'] as const,
  lists: () => [...pageKeys.all, 'list'] as const,
  list: (filters: PageFilters) => [...pageKeys.lists(), filters] as const,
  detail: (id: string) => [...pageKeys.all, 'detail', id] as const,
  dashboard: () => [...pageKeys.all, 'dashboard'] as const,
  preview: (id: string, revisionNumber?: number) => [...pageKeys.all, 'preview', id, revisionNumber] as const,
  published: (id: string) => [...pageKeys.all, 'published', id] as const,
  problems: (id: string) => [...pageKeys.all, 'problems', id] as const,
  revisions: (id: string) => [...pageKeys.all, 'revisions', id] as const,
  diff: (id: string, from?: number, to?: number) => [...pageKeys.all, 'diff', id, from, to] as const,
  comments: (id: string) => [...pageKeys.all, 'comments', id] as const,
  versionLists: () => [...pageKeys.all, 'versions'] as const,
  versions: (id: string) => [...pageKeys.versionLists(), id] as const,
};

export const pagesQueryOptions = (filters: PageFilters) =>
  queryOptions({
    queryKey: pageKeys.list(filters),
    queryFn: () => api.get<PageList>(`/pages${queryString(filters)}`),
    placeholderData: keepPreviousData,
  });

/** One page of the page list (the previous page stays on screen while the next loads). */
export const usePages = (filters: PageFilters) => useQuery(pagesQueryOptions(filters));

/** Fetches one page with everything the editor and review show. */
export const getPage = async (id: string) => (await api.get<ApiData<PageDto>>(`/pages/${id}`)).data;

export const pageQueryOptions = (id: string) =>
  queryOptions({ queryKey: pageKeys.detail(id), queryFn: () => getPage(id), staleTime: 0 });

/** One page, always fetched afresh when a screen opens it. */
export const usePage = (id: string) => useQuery(pageQueryOptions(id));

export const dashboardQueryOptions = () =>
  queryOptions({
    queryKey: pageKeys.dashboard(),
    queryFn: async () => (await api.get<ApiData<DashboardDto>>('/pages/dashboard')).data,
    staleTime: 10_000,
  });

/** The signed-in person's dashboard. */
export const useDashboard = () => useQuery(dashboardQueryOptions());

export const previewQueryOptions = (id: string, revisionNumber?: number) =>
  queryOptions({
    queryKey: pageKeys.preview(id, revisionNumber),
    queryFn: async () => (await api.get<ApiData<RenderedPage>>(`/pages/${id}/preview`)).data,
  });

/** The working copy rendered as the public would see it. */
export const usePreview = (id: string, revisionNumber?: number) => useQuery(previewQueryOptions(id, revisionNumber));

export const publishedQueryOptions = (id: string) =>
  queryOptions({
    queryKey: pageKeys.published(id),
    queryFn: async () =>
      (
        await api.get<ApiData<(RenderedPage & { publishedAt: string | null; publicUrl: string | null }) | null>>(
          `/pages/${id}/published`,
        )
      ).data,
  });

/** The version the public sees now (null when unpublished); loaded only when `enabled`. */
export const usePublished = (id: string, enabled: boolean) => useQuery({ ...publishedQueryOptions(id), enabled });

export const approvalProblemsQueryOptions = (id: string) =>
  queryOptions({
    queryKey: pageKeys.problems(id),
    queryFn: async () => (await api.get<ApiData<{ problems: string[] }>>(`/pages/${id}/approval-problems`)).data.problems,
  });

/** What stands in the way of approving the page; loaded only when `enabled`. */
export const useApprovalProblems = (id: string, enabled: boolean) => useQuery({ ...approvalProblemsQueryOptions(id), enabled });

/**
 * Saves the page (autosave). A stale version answers 409 with the server's version in the error
 * (`pageConflictOf`); the caller handles it.
 */
export const savePage = async (id: string, body: { version: number; title: string; doc: unknown }) =>
  (await api.put<ApiData<PageDto>>(`/pages/${id}`, body, { timeoutMs: 30_000 })).data;

/**
 * The server's version from a save refused because someone else saved first (409 `page_changed`,
 * which carries it as `error.current`), or null for any other failure.
 * @param error what a save threw
 */
export function pageConflictOf(error: unknown): PageServerVersion | null {
  if (!(error instanceof ApiRequestError) || error.status !== 409 || error.code !== 'page_changed') return null;
  const current = PageServerVersionSchema.safeParse(error.current);
  return current.success ? current.data : null;
}

/** Starts a page about an object. */
export function useCreatePage() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: PageCreateInput) => (await api.post<ApiData<PageDto>>('/pages', input)).data,
    onSuccess: (page) => {
      queryClient.setQueryData(pageKeys.detail(page.id), page);
      void queryClient.invalidateQueries({ queryKey: pageKeys.lists() });
    },
  });
}

/**
 * A change whose answer is the page as it is now: the answer replaces the cached page, and every
 * other page query and every statement (sign-offs, flags) is refreshed.
 */
export function usePageChange<T = void>(id: string, call: (arg: T) => Promise<ApiData<PageDto>>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (arg: T) => (await call(arg)).data,
    onSuccess: (page) => {
      queryClient.setQueryData(pageKeys.detail(id), page);
      const detail = hashKey(pageKeys.detail(id));
      void queryClient.invalidateQueries({ queryKey: pageKeys.all, predicate: (q) => q.queryHash !== detail });
      void queryClient.invalidateQueries({ queryKey: statementKeys.all });
    },
  });
}

/** Turns the digest e-mail on or off for the signed-in person. */
export function useSetDigest() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (enabled: boolean) => (await api.put<ApiData<{ digest: boolean }>>('/pages/digest', { enabled })).data,
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: pageKeys.dashboard() }),
  });
}

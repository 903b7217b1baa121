import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  DashboardDto,
  PageCommentDto,
  PageCreateInput,
  PageDto,
  PageRevisionDto,
  PageRow,
  PageStatus,
  RevisionDiffDto,
} from '@shared/schemas/page.ts';
import type { MediaDto } from '@shared/media/schemas.ts';
import type { SkyObjectPageDto } from '@shared/schemas/sky-object.ts';
import { api, type ApiData } from '@/lib/api-client.ts';

export interface PageFilters {
  status?: PageStatus;
  objectId?: string;
  writerId?: string;
  q?: string;
  page?: number;
}

type PageList = { data: PageRow[]; meta: { total: number; page: number; pageSize: number } };

const toQuery = (f: object) => {
  const params = new URLSearchParams();
  for (const [k, v] of Object.entries(f)) if (v !== undefined && v !== '') params.set(k, String(v));
  const s = params.toString();
  return s ? `?${s}` : '';
};

export const pagesQueryOptions = (filters: PageFilters) =>
  queryOptions({
    queryKey: ['pages', 'list', filters],
    queryFn: () => api.get<PageList>(`/pages${toQuery(filters)}`),
    placeholderData: keepPreviousData,
  });
export const usePages = (filters: PageFilters) => useQuery(pagesQueryOptions(filters));

export const pageQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ['pages', 'one', id],
    queryFn: async () => (await api.get<ApiData<PageDto>>(`/pages/${id}`)).data,
    staleTime: 0,
  });
export const usePage = (id: string) => useQuery(pageQueryOptions(id));

/** Fetches the page now, bypassing the cache (the server's version after a 409). */
export const fetchPage = async (id: string) => (await api.get<ApiData<PageDto>>(`/pages/${id}`)).data;

export const dashboardQueryOptions = () =>
  queryOptions({
    queryKey: ['pages', 'dashboard'],
    queryFn: async () => (await api.get<ApiData<DashboardDto>>('/pages/dashboard')).data,
    staleTime: 10_000,
  });
export const useDashboard = () => useQuery(dashboardQueryOptions());

export const usePreview = (id: string, revisionNumber?: number) =>
  useQuery({
    queryKey: ['pages', 'preview', id, revisionNumber],
    queryFn: async () =>
      (await api.get<ApiData<{ title: string; html: string; revisionNumber: number }>>(`/pages/${id}/preview`)).data,
  });

export const usePublished = (id: string, enabled: boolean) =>
  useQuery({
    queryKey: ['pages', 'published', id],
    enabled,
    queryFn: async () =>
      (
        await api.get<ApiData<{ title: string; html: string; revisionNumber: number; publishedAt: string | null } | null>>(
          `/pages/${id}/published`,
        )
      ).data,
  });

export const useApprovalProblems = (id: string, enabled: boolean) =>
  useQuery({
    queryKey: ['pages', 'problems', id],
    enabled,
    queryFn: async () => (await api.get<ApiData<{ problems: string[] }>>(`/pages/${id}/approval-problems`)).data.problems,
  });

export const useRevisions = (id: string) =>
  useQuery({
    queryKey: ['pages', 'revisions', id],
    queryFn: async () => (await api.get<ApiData<PageRevisionDto[]>>(`/pages/${id}/revisions`)).data,
  });

export const useRevisionDiff = (id: string, from?: number, to?: number) =>
  useQuery({
    queryKey: ['pages', 'diff', id, from, to],
    enabled: !!from && !!to && from !== to,
    queryFn: async () => (await api.get<ApiData<RevisionDiffDto>>(`/pages/${id}/revisions/diff?from=${from}&to=${to}`)).data,
  });

export const useComments = (id: string) =>
  useQuery({
    queryKey: ['pages', 'comments', id],
    queryFn: async () => (await api.get<ApiData<PageCommentDto[]>>(`/pages/${id}/comments`)).data,
  });

/** Objects for the pickers, searched by name or designation. */
export const useObjectSearch = (q: string) =>
  useQuery({
    queryKey: ['catalogue', 'objects', 'pick', q],
    queryFn: async () =>
      (await api.get<ApiData<SkyObjectPageDto>>(`/catalogue/objects?pageSize=20${q ? `&q=${encodeURIComponent(q)}` : ''}`)).data
        .rows,
    placeholderData: keepPreviousData,
  });

/** Saves the page (autosave); the caller handles 409 itself. */
export const savePage = async (id: string, body: { version: number; title: string; doc: unknown }) =>
  (await api.put<ApiData<PageDto>>(`/pages/${id}`, body, { timeoutMs: 30_000 })).data;

export function useCreatePage() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: PageCreateInput) => (await api.post<ApiData<PageDto>>('/pages', input)).data,
    onSuccess: (page) => {
      queryClient.setQueryData(pageQueryOptions(page.id).queryKey, page);
      void queryClient.invalidateQueries({ queryKey: ['pages', 'list'] });
    },
  });
}

/** One workflow step on a page; the answer is the page as it is now. */
export function usePageAction<T = void>(id: string, call: (arg: T) => Promise<ApiData<PageDto>>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (arg: T) => (await call(arg)).data,
    onSuccess: (page) => {
      queryClient.setQueryData(pageQueryOptions(id).queryKey, page);
      void queryClient.invalidateQueries({
        queryKey: ['pages'],
        predicate: (q) => !(q.queryKey[1] === 'one' && q.queryKey[2] === id),
      });
      void queryClient.invalidateQueries({ queryKey: ['statements'] });
    },
  });
}

export const useSubmitPage = (id: string) =>
  usePageAction(id, (input: { version: number; flagNotes?: Array<{ text: string; reason: string }> }) =>
    api.post(`/pages/${id}/submit`, input),
  );
export const useWithdrawPage = (id: string) => usePageAction(id, () => api.post(`/pages/${id}/withdraw`));
export const useSendBack = (id: string) =>
  usePageAction(id, (comment: string) => api.post(`/pages/${id}/send-back`, { comment }));
export const useSignOffStatement = (id: string) =>
  usePageAction(id, (statementId: string) => api.post(`/pages/${id}/signoffs/statements`, { statementId }));
export const useSignOffPage = (id: string) => usePageAction(id, () => api.post(`/pages/${id}/signoffs/page`));
export const useResolveFlag = (id: string) =>
  usePageAction(id, (input: { text: string; reason: string }) => api.post(`/pages/${id}/flags`, input));
export const usePublishPage = (id: string) => usePageAction(id, () => api.post(`/pages/${id}/publish`));
export const useUnpublishPage = (id: string) => usePageAction(id, () => api.post(`/pages/${id}/unpublish`));
export const useSchedulePage = (id: string) => usePageAction(id, (at: string | null) => api.put(`/pages/${id}/schedule`, { at }));
export const useRestoreRevision = (id: string) =>
  usePageAction(id, (input: { number: number; version: number }) =>
    api.post(`/pages/${id}/revisions/${input.number}/restore`, { version: input.version }),
  );

export function useAddComment(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: string) => (await api.post<ApiData<PageCommentDto>>(`/pages/${id}/comments`, { body })).data,
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: ['pages', 'comments', id] }),
  });
}

export function useSetDigest() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (enabled: boolean) => (await api.put<ApiData<{ digest: boolean }>>('/pages/digest', { enabled })).data,
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: ['pages', 'dashboard'] }),
  });
}

/** One library image, for the editor's image blocks. */
export const useMediaItem = (id: string | null) =>
  useQuery({
    queryKey: ['media', 'one', id],
    enabled: !!id,
    queryFn: async () => (await api.get<ApiData<MediaDto>>(`/media/${id}`)).data,
    staleTime: 60_000,
  });

/** Library images for the image picker. */
export const useMediaSearch = (q: string) =>
  useQuery({
    queryKey: ['media', 'pick', q],
    queryFn: async () => (await api.get<{ data: MediaDto[] }>(`/media${q ? `?q=${encodeURIComponent(q)}` : ''}`)).data,
    placeholderData: keepPreviousData,
  });

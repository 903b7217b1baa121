/**
 * Statements as the client reads and changes them. Shared by every screen that shows or inserts a
 * statement (the statements pages, the page editor and review), so it sits outside the features.
 */
import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  StatementCreateInput,
  StatementDto,
  StatementStatusValue,
  StatementTemplateDto,
} from '@shared/schemas/statement.ts';
import { api, type ApiData } from '@/lib/api-client.ts';
import { queryString } from '@/lib/query-string.ts';

/** What the statement list can be narrowed by. */
export interface StatementFilters {
  status?: StatementStatusValue;
  objectId?: string;
  templateId?: string;
  page?: number;
}

type StatementPage = { data: StatementDto[]; meta: { total: number; page: number; pageSize: number } };

/** Every query key for statements, written once (the templates change only with a release, so they sit apart). */
export const statementKeys = {
  all: ['statements'] as const,
  lists: () => [...statementKeys.all, 'list'] as const,
  list: (filters: StatementFilters) => [...statementKeys.lists(), filters] as const,
  detail: (id: string) => [...statementKeys.all, 'detail', id] as const,
  templates: () => ['statement-templates'] as const,
};

export const statementsQueryOptions = (filters: StatementFilters) =>
  queryOptions({
    queryKey: statementKeys.list(filters),
    queryFn: () => api.get<StatementPage>(`/statements${queryString(filters)}`),
    placeholderData: keepPreviousData,
  });

/** One page of statements matching the filters (the previous page stays on screen while the next loads). */
export const useStatements = (filters: StatementFilters) => useQuery(statementsQueryOptions(filters));

export const statementQueryOptions = (id: string) =>
  queryOptions({
    queryKey: statementKeys.detail(id),
    queryFn: async () => (await api.get<ApiData<StatementDto>>(`/statements/${id}`)).data,
  });

/** One statement with its texts and working. */
export const useStatement = (id: string) => useQuery(statementQueryOptions(id));

export const statementTemplatesQueryOptions = () =>
  queryOptions({
    queryKey: statementKeys.templates(),
    queryFn: async () => (await api.get<ApiData<StatementTemplateDto[]>>('/statement-templates')).data,
    staleTime: Infinity,
  });

/** The statement templates a writer can choose from (they change only with a release). */
export const useStatementTemplates = () => useQuery(statementTemplatesQueryOptions());

function useStatementMutation<T>(fn: (arg: T) => Promise<StatementDto>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: (statement) => {
      queryClient.setQueryData(statementKeys.detail(statement.id), statement);
      void queryClient.invalidateQueries({ queryKey: statementKeys.lists() });
    },
  });
}

/** Works out a new statement, or finds the existing one for the same object and template. */
export const useCreateStatement = () =>
  useStatementMutation(async (input: StatementCreateInput) => (await api.post<ApiData<StatementDto>>('/statements', input)).data);
/** Accepts a statement's new wording (the server decides who may). */
export const useAcceptStatement = () =>
  useStatementMutation(async (id: string) => (await api.post<ApiData<StatementDto>>(`/statements/${id}/accept`)).data);
/** Works a statement out again now. */
export const useRecomputeStatement = () =>
  useStatementMutation(async (id: string) => (await api.post<ApiData<StatementDto>>(`/statements/${id}/recompute`)).data);

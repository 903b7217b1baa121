/** Proposed objects and sources: the list, proposing one, and a reviewer's decision. */
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  ObjectProposalInput,
  ProposalDto,
  ProposalReviewInput,
  SourceProposalInput,
} from '@shared/schemas/catalogue-proposal.ts';
import { api, type ApiData } from '@/lib/api-client.ts';
import { catalogueKeys } from './catalogue-objects.ts';

const proposalsQueryOptions = () =>
  queryOptions({
    queryKey: catalogueKeys.proposals(),
    queryFn: async () => (await api.get<ApiData<ProposalDto[]>>('/catalogue/proposals?status=all')).data,
  });

/** Every recent proposal (waiting ones and the latest reviewed), newest first. */
export const useProposals = () => useQuery(proposalsQueryOptions());

/** A writer or editor proposes an object, citing a source. */
export function useProposeObject() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: ObjectProposalInput) =>
      (await api.post<ApiData<ProposalDto>>('/catalogue/proposals/objects', input)).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.proposals() }),
  });
}

/** A writer or editor proposes a source. */
export function useProposeSource() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: SourceProposalInput) =>
      (await api.post<ApiData<ProposalDto>>('/catalogue/proposals/sources', input)).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.proposals() }),
  });
}

/** A reviewer accepts or declines a proposal; an accepted one adds an object or source, so every catalogue query refreshes. */
export function useReviewProposal() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, ...input }: ProposalReviewInput & { id: string }) =>
      (await api.post<ApiData<ProposalDto>>(`/catalogue/proposals/${id}/review`, input)).data,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.all }),
  });
}

/** The calculator: one quantity computed on the server, with its working. */
import { useMutation, type UseMutationOptions } from '@tanstack/react-query';
import type { CalcRequest, CalcSuccess } from '@shared/schemas/calc.ts';
import { api, type ApiData, type ApiRequestError } from '@/lib/api-client.ts';

/**
 * Asks the server to compute one quantity (`POST /api/calc`).
 * @param request a calculation request (the shared contract)
 * @returns the result with its working
 * @throws ApiRequestError with the engine's message naming the input when the request is refused
 */
export async function calculate(request: CalcRequest): Promise<CalcSuccess> {
  return (await api.post<ApiData<CalcSuccess>>('/calc', request)).data;
}

/**
 * A calculation as a mutation: nothing is cached, because every request is computed
 * afresh and a result belongs to the form that asked for it.
 * @param options passed through to useMutation (the caller's onSuccess still runs)
 * @returns the mutation
 */
export function useCalculate(options: Omit<UseMutationOptions<CalcSuccess, ApiRequestError, CalcRequest>, 'mutationFn'> = {}) {
  return useMutation<CalcSuccess, ApiRequestError, CalcRequest>({ ...options, mutationFn: calculate });
}

import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MemberResult } from 'ligament/engine';
import { api, unwrap } from '@/lib/api-client';

/** Recomputed member results; `result` is the engine's MemberResult (ligament package types). */
export async function getMemberResults(submittalId: number) {
  const rows = unwrap(
    await api.GET('/api/submittals/{submittalId}/results', { params: { path: { submittalId } } }),
  );
  return rows.map((row) => ({ ...row, result: row.result as unknown as MemberResult }));
}

export const getMemberResultsQueryOptions = (submittalId: number) =>
  queryOptions({
    queryKey: ['submittals', submittalId, 'results'],
    queryFn: () => getMemberResults(submittalId),
  });

export function useMemberResults(submittalId: number) {
  return useQuery(getMemberResultsQueryOptions(submittalId));
}

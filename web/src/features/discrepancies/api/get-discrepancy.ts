import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export async function getDiscrepancy(discrepancyId: number) {
  return unwrap(await api.GET('/api/discrepancies/{discrepancyId}', { params: { path: { discrepancyId } } }));
}

export const getDiscrepancyQueryOptions = (discrepancyId: number) =>
  queryOptions({ queryKey: ['discrepancy', discrepancyId], queryFn: () => getDiscrepancy(discrepancyId) });

export function useDiscrepancy(discrepancyId: number | null) {
  return useQuery({ ...getDiscrepancyQueryOptions(discrepancyId ?? 0), enabled: discrepancyId !== null });
}

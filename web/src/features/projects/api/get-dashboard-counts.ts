import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

/** The open-discrepancy figures for one project (the dashboard endpoint, scoped to the project). */
export async function getProjectCounts(projectId: number) {
  return unwrap(await api.GET('/api/dashboard', { params: { query: { projectId } } }));
}

export const getProjectCountsQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['dashboard', { projectId }], queryFn: () => getProjectCounts(projectId) });

export function useProjectCounts(projectId: number) {
  return useQuery(getProjectCountsQueryOptions(projectId));
}

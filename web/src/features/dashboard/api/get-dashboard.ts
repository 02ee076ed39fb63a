import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export async function getDashboard(projectId?: number) {
  return unwrap(await api.GET('/api/dashboard', { params: { query: projectId ? { projectId } : {} } }));
}

export const getDashboardQueryOptions = (projectId?: number) =>
  queryOptions({
    queryKey: ['dashboard', { projectId }],
    queryFn: () => getDashboard(projectId),
    staleTime: 0,
  });

export function useDashboard(projectId?: number) {
  return useQuery(getDashboardQueryOptions(projectId));
}

import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export async function getDiscrepancyProjects() {
  return unwrap(await api.GET('/api/projects'));
}

export const getDiscrepancyProjectsQueryOptions = () =>
  queryOptions({ queryKey: ['projects'], queryFn: getDiscrepancyProjects });

export function useDiscrepancyProjects() {
  return useQuery(getDiscrepancyProjectsQueryOptions());
}

import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export async function getAdminProjects() {
  return unwrap(await api.GET('/api/projects'));
}

export const getAdminProjectsQueryOptions = () =>
  queryOptions({ queryKey: ['projects'], queryFn: getAdminProjects });

export function useAdminProjects() {
  return useQuery(getAdminProjectsQueryOptions());
}

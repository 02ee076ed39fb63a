import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export async function getProjects() {
  return unwrap(await api.GET('/api/projects'));
}

export const getProjectsQueryOptions = () => queryOptions({ queryKey: ['projects'], queryFn: getProjects });

export function useProjects() {
  return useQuery(getProjectsQueryOptions());
}

import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

/** The projects a token may be made for: the caller's own. */
export async function getAccountProjects() {
  return unwrap(await api.GET('/api/projects'));
}

export const getAccountProjectsQueryOptions = () =>
  queryOptions({ queryKey: ['projects'], queryFn: getAccountProjects });

export function useAccountProjects() {
  return useQuery(getAccountProjectsQueryOptions());
}

import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export async function getProjectPeople(projectId: number) {
  return unwrap(await api.GET('/api/projects/{projectId}/members', { params: { path: { projectId } } }));
}

/** Who can be assigned a discrepancy: the project's active consultants and checkers. */
export function useAssignablePeople(projectId: number, enabled: boolean) {
  return useQuery({
    ...queryOptions({
      queryKey: ['projects', projectId, 'members'],
      queryFn: () => getProjectPeople(projectId),
    }),
    enabled,
    select: (people) => people.filter((p) => p.active && (p.role === 'consultant' || p.role === 'checker')),
  });
}

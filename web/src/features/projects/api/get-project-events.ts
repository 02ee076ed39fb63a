import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export const EVENTS_PAGE_SIZE = 15;

async function getEventsPage(projectId: number, page: number) {
  return unwrap(
    await api.GET('/api/projects/{projectId}/events', {
      params: { path: { projectId }, query: { page, pageSize: EVENTS_PAGE_SIZE } },
    }),
  );
}

/**
 * One page of the project's event log. The API pages oldest first; `page: 'latest'` asks for the
 * count and then the last page, so the activity view opens on what just happened. A last page
 * holding only a few events is topped up from the one before, so the view opens on a full page.
 */
export async function getProjectEvents(projectId: number, page: number | 'latest') {
  if (page !== 'latest') return getEventsPage(projectId, page);
  const first = await getEventsPage(projectId, 1);
  const last = Math.max(1, Math.ceil(first.total / EVENTS_PAGE_SIZE));
  if (last === 1) return first;
  const [before, latest] = await Promise.all([
    last === 2 ? first : getEventsPage(projectId, last - 1),
    getEventsPage(projectId, last),
  ]);
  return { ...latest, items: [...before.items, ...latest.items].slice(-EVENTS_PAGE_SIZE) };
}

export const getProjectEventsQueryOptions = (projectId: number, page: number | 'latest') =>
  queryOptions({
    queryKey: ['projects', projectId, 'events', page],
    queryFn: () => getProjectEvents(projectId, page),
  });

export function useProjectEvents(projectId: number, page: number | 'latest') {
  return useQuery({ ...getProjectEventsQueryOptions(projectId, page), placeholderData: keepPreviousData });
}

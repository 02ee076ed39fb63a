import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export const NOTIFICATIONS_PAGE_SIZE = 25;

export async function getNotifications(page: number, unread: boolean) {
  return unwrap(
    await api.GET('/api/notifications', {
      params: { query: { page, pageSize: NOTIFICATIONS_PAGE_SIZE, unread: unread || undefined } },
    }),
  );
}

export const getNotificationsQueryOptions = (page: number, unread: boolean) =>
  queryOptions({
    queryKey: ['notifications', 'list', { page, unread }],
    queryFn: () => getNotifications(page, unread),
    placeholderData: keepPreviousData,
  });

export function useNotifications(page: number, unread: boolean) {
  return useQuery(getNotificationsQueryOptions(page, unread));
}

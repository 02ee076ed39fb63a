import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export async function getUnreadCount() {
  return unwrap(await api.GET('/api/notifications/unread-count'));
}

/** How often the header asks for the count while the app is open. */
const POLL_MS = 30_000;

export const getUnreadCountQueryOptions = () =>
  queryOptions({ queryKey: ['notifications', 'unread'], queryFn: getUnreadCount });

/** The unread count in the header: asked on sign-in, on return to the tab, and every half minute. */
export function useUnreadCount(enabled: boolean) {
  return useQuery({
    ...getUnreadCountQueryOptions(),
    enabled,
    staleTime: 0,
    refetchInterval: POLL_MS,
    refetchOnWindowFocus: true,
  });
}

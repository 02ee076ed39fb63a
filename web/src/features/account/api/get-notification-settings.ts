import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export async function getNotificationSettings() {
  return unwrap(await api.GET('/api/notifications/settings'));
}

export const getNotificationSettingsQueryOptions = () =>
  queryOptions({ queryKey: ['notifications', 'settings'], queryFn: getNotificationSettings });

export function useNotificationSettings() {
  return useQuery(getNotificationSettingsQueryOptions());
}

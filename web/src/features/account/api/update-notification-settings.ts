import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';
import type { Schema } from '@/lib/api-schemas';
import { notify } from '@/lib/notify';

export type NotificationChoice = Schema<'NotificationSettingInput'>;

export async function updateNotificationSettings(settings: NotificationChoice[]) {
  return unwrap(await api.PUT('/api/notifications/settings', { body: { settings } }));
}

export function useUpdateNotificationSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateNotificationSettings,
    onSuccess: (settings) => {
      queryClient.setQueryData(['notifications', 'settings'], settings);
      notify({ intent: 'success', title: 'Notification choices saved' });
    },
  });
}

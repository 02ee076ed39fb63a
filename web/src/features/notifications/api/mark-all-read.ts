import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';
import { notify } from '@/lib/notify';

export async function markAllRead() {
  return unwrap(await api.POST('/api/notifications/read-all'));
}

export function useMarkAllRead() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: markAllRead,
    onSuccess: ({ marked }) => {
      void queryClient.invalidateQueries({ queryKey: ['notifications'] });
      notify({
        intent: 'success',
        title: marked === 1 ? '1 notification marked read' : `${marked} notifications marked read`,
      });
    },
  });
}

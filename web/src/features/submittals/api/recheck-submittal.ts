import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

/** Re-runs the stored files with the service's current engine; the stored results are not changed. */
export async function recheckSubmittal(submittalId: number) {
  return unwrap(
    await api.POST('/api/submittals/{submittalId}/recheck', { params: { path: { submittalId } } }),
  );
}

export function useRecheckSubmittal(submittalId: number, projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => recheckSubmittal(submittalId),
    // The recheck is recorded as an event; nothing else it touches is cached.
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: ['projects', projectId, 'events'] }),
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export async function acknowledgeDiscrepancy(discrepancyId: number) {
  return unwrap(
    await api.POST('/api/discrepancies/{discrepancyId}/acknowledge', { params: { path: { discrepancyId } } }),
  );
}

export function useAcknowledgeDiscrepancy(discrepancyId: number, projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => acknowledgeDiscrepancy(discrepancyId),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: ['discrepancy', discrepancyId] });
      void queryClient.invalidateQueries({ queryKey: ['discrepancies', projectId] });
    },
  });
}

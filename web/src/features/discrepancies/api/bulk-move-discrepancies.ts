import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api, unwrap } from '@/lib/api-client';
import { notify } from '@/lib/notify';

export const bulkMoveInputSchema = z.object({
  ids: z.array(z.number().int().positive()).min(1).max(500),
  to: z.enum(['accepted', 'returned', 'waived']),
  note: z.string().trim().max(4000).optional(),
});
export type BulkMoveInput = z.infer<typeof bulkMoveInputSchema>;

export async function bulkMoveDiscrepancies(projectId: number, input: BulkMoveInput) {
  return unwrap(
    await api.POST('/api/projects/{projectId}/discrepancies/bulk-transition', {
      params: { path: { projectId } },
      body: { ids: input.ids, to: input.to, ...(input.note ? { note: input.note } : {}) },
    }),
  );
}

export function useBulkMoveDiscrepancies(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: BulkMoveInput) => bulkMoveDiscrepancies(projectId, input),
    onSuccess: (result, input) => {
      void queryClient.invalidateQueries({ queryKey: ['discrepancies', projectId] });
      void queryClient.invalidateQueries({ queryKey: ['discrepancy'] });
      void queryClient.invalidateQueries({ queryKey: ['projects'] });
      void queryClient.invalidateQueries({ queryKey: ['submittals'] });
      void queryClient.invalidateQueries({ queryKey: ['dashboard'] });
      void queryClient.invalidateQueries({ queryKey: ['notifications'] });
      notify({
        intent: 'success',
        title: `${result.moved} discrepanc${result.moved === 1 ? 'y' : 'ies'} ${
          { accepted: 'accepted', returned: 'returned to the consultant', waived: 'waived' }[input.to]
        }`,
      });
    },
  });
}

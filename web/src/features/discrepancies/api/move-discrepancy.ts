import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api, unwrap } from '@/lib/api-client';
import { notify } from '@/lib/notify';

export const moveInputSchema = z.object({
  to: z.enum(['answered', 'accepted', 'returned', 'waived']),
  note: z.string().trim().max(4000).optional(),
});
export type MoveInput = z.infer<typeof moveInputSchema>;

/** What each move must carry (the API's rule, shown before sending so the form can say so). */
export const moveNeedsNote: Record<MoveInput['to'], boolean> = {
  answered: true,
  accepted: false,
  returned: true,
  waived: true,
};

export async function moveDiscrepancy(discrepancyId: number, input: MoveInput) {
  return unwrap(
    await api.POST('/api/discrepancies/{discrepancyId}/transitions', {
      params: { path: { discrepancyId } },
      body: { to: input.to, ...(input.note ? { note: input.note } : {}) },
    }),
  );
}

export function useMoveDiscrepancy(discrepancyId: number, projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: MoveInput) => moveDiscrepancy(discrepancyId, input),
    onSuccess: (_, input) => {
      void queryClient.invalidateQueries({ queryKey: ['discrepancy', discrepancyId] });
      void queryClient.invalidateQueries({ queryKey: ['discrepancies', projectId] });
      void queryClient.invalidateQueries({ queryKey: ['projects'] });
      void queryClient.invalidateQueries({ queryKey: ['submittals'] });
      void queryClient.invalidateQueries({ queryKey: ['dashboard'] });
      notify({ intent: 'success', title: `Discrepancy ${input.to}` });
    },
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api, unwrap } from '@/lib/api-client';
import { notify } from '@/lib/notify';

export const assignInputSchema = z.object({
  assigneeId: z.number().int().positive().nullable(),
  dueDate: z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/, 'Pick a day, or leave it empty.')
    .nullable(),
});
export type AssignInput = z.infer<typeof assignInputSchema>;

export async function assignDiscrepancy(discrepancyId: number, input: AssignInput & { version?: number }) {
  return unwrap(
    await api.PATCH('/api/discrepancies/{discrepancyId}/assignment', {
      params: { path: { discrepancyId } },
      body: input,
    }),
  );
}

export function useAssignDiscrepancy(discrepancyId: number, projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: AssignInput & { version?: number }) => assignDiscrepancy(discrepancyId, input),
    onSuccess: (detail) => {
      queryClient.setQueryData(['discrepancy', discrepancyId], detail);
      void queryClient.invalidateQueries({ queryKey: ['discrepancies', projectId] });
      notify({
        intent: 'success',
        title: detail.assignee ? `Assigned to ${detail.assignee.name}` : 'No one assigned',
        body: detail.dueDate ? `Due ${detail.dueDate}.` : undefined,
      });
    },
  });
}

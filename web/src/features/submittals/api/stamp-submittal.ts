import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api, unwrap } from '@/lib/api-client';

export const STAMP_ACTIONS = [
  'no-exceptions-taken',
  'make-corrections-noted',
  'revise-and-resubmit',
  'rejected',
] as const;

export const stampActionLabels: Record<(typeof STAMP_ACTIONS)[number], string> = {
  'no-exceptions-taken': 'No exceptions taken',
  'make-corrections-noted': 'Make corrections noted',
  'revise-and-resubmit': 'Revise and resubmit',
  rejected: 'Rejected',
};

export const stampInputSchema = z.object({
  action: z.enum(STAMP_ACTIONS),
  comment: z.string().trim().min(1, 'Say what the stamp means for the consultant.').max(4000),
  overrideReason: z.string().trim().max(4000).optional(),
});
export type StampInput = z.infer<typeof stampInputSchema>;

export async function stampSubmittal(submittalId: number, input: StampInput) {
  const body = {
    action: input.action,
    comment: input.comment,
    ...(input.overrideReason ? { overrideReason: input.overrideReason } : {}),
  };
  return unwrap(
    await api.POST('/api/submittals/{submittalId}/stamp', { params: { path: { submittalId } }, body }),
  );
}

export function useStampSubmittal(submittalId: number, projectId: number | undefined) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: StampInput) => stampSubmittal(submittalId, input),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: ['submittals', submittalId] });
      if (projectId !== undefined) {
        void queryClient.invalidateQueries({ queryKey: ['projects', projectId, 'submittals'] });
        void queryClient.invalidateQueries({ queryKey: ['projects', projectId, 'events'] });
      }
      void queryClient.invalidateQueries({ queryKey: ['dashboard'] });
    },
  });
}

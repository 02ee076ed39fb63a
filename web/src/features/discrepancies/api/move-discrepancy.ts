import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api, unwrap } from '@/lib/api-client';
import { notify } from '@/lib/notify';

/**
 * What each move must carry (the API's rule, shown before sending so the form can say so). An answer
 * needs a note or a linked revision.
 */
export const moveNeedsNote: Record<'answered' | 'accepted' | 'returned' | 'waived', boolean> = {
  answered: true,
  accepted: false,
  returned: true,
  waived: true,
};

export const moveInputSchema = z
  .object({
    to: z.enum(['answered', 'accepted', 'returned', 'waived']),
    note: z.string().trim().max(4000).optional(),
    /** answered only: the submittal that revises the discrepancy's submittal. */
    revisionSubmittalId: z.number().int().min(1).optional(),
  })
  .refine((m) => m.to !== 'answered' || Boolean(m.note) || m.revisionSubmittalId !== undefined, {
    message: 'An answer needs a note or a linked revision.',
    path: ['note'],
  })
  .refine((m) => m.to === 'answered' || Boolean(m.note) || !moveNeedsNote[m.to], {
    message: 'This move needs a note.',
    path: ['note'],
  });
export type MoveInput = z.infer<typeof moveInputSchema>;

/** A move, and the version of the item the mover saw (the API refuses it if someone changed it since). */
export async function moveDiscrepancy(discrepancyId: number, input: MoveInput & { version?: number }) {
  return unwrap(
    await api.POST('/api/discrepancies/{discrepancyId}/transitions', {
      params: { path: { discrepancyId } },
      body: {
        to: input.to,
        ...(input.note ? { note: input.note } : {}),
        ...(input.to === 'answered' && input.revisionSubmittalId !== undefined
          ? { revisionSubmittalId: input.revisionSubmittalId }
          : {}),
        ...(input.version !== undefined ? { version: input.version } : {}),
      },
    }),
  );
}

/** What the toast says a move did, by the move's name (a reopen lands on returned, but is a reopen). */
const DONE: Record<string, string> = {
  answer: 'Answer sent',
  accept: 'Answer accepted',
  return: 'Returned to the consultant',
  waive: 'Waived',
  reopen: 'Reopened: back with the consultant',
};

export function useMoveDiscrepancy(discrepancyId: number, projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // `action` names the move for the toast; the API is told only where it goes (`to`).
    mutationFn: (input: MoveInput & { action?: string; version?: number }) =>
      moveDiscrepancy(discrepancyId, input),
    onSuccess: (detail, input) => {
      queryClient.setQueryData(['discrepancy', discrepancyId], detail);
      void queryClient.invalidateQueries({ queryKey: ['discrepancy', discrepancyId] });
      void queryClient.invalidateQueries({ queryKey: ['discrepancies', projectId] });
      void queryClient.invalidateQueries({ queryKey: ['projects'] });
      void queryClient.invalidateQueries({ queryKey: ['submittals'] });
      void queryClient.invalidateQueries({ queryKey: ['dashboard'] });
      void queryClient.invalidateQueries({ queryKey: ['notifications'] });
      notify({ intent: 'success', title: DONE[input.action ?? ''] ?? `Moved to ${input.to}` });
    },
  });
}

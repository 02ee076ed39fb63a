import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api, unwrap } from '@/lib/api-client';

export const commentInputSchema = z.object({
  body: z.string().trim().min(1, 'Write a comment first.').max(4000),
});
export type CommentInput = z.infer<typeof commentInputSchema>;

export async function commentOnDiscrepancy(discrepancyId: number, input: CommentInput) {
  return unwrap(
    await api.POST('/api/discrepancies/{discrepancyId}/comments', {
      params: { path: { discrepancyId } },
      body: input,
    }),
  );
}

export function useCommentOnDiscrepancy(discrepancyId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CommentInput) => commentOnDiscrepancy(discrepancyId, input),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: ['discrepancy', discrepancyId] }),
  });
}

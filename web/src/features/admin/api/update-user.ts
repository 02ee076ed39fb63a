import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api, unwrap } from '@/lib/api-client';

export const updateUserInputSchema = z.object({
  role: z.enum(['admin', 'consultant', 'checker', 'owner-rep']).optional(),
  active: z.boolean().optional(),
});
export type UpdateUserInput = z.infer<typeof updateUserInputSchema>;

export async function updateUser(userId: number, input: UpdateUserInput) {
  return unwrap(await api.PATCH('/api/users/{userId}', { params: { path: { userId } }, body: input }));
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, input }: { userId: number; input: UpdateUserInput }) => updateUser(userId, input),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: ['users'] }),
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api, unwrap } from '@/lib/api-client';

export const createTokenInputSchema = z.object({
  name: z.string().trim().min(1, 'Name the token after where it will be used.').max(100),
  projectId: z.number({ error: 'Choose the project the token may upload to.' }).int().positive(),
});
export type CreateTokenInput = z.infer<typeof createTokenInputSchema>;

export async function createToken(input: CreateTokenInput) {
  return unwrap(await api.POST('/api/tokens', { body: input }));
}

export function useCreateToken() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createToken,
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: ['tokens'] }),
  });
}

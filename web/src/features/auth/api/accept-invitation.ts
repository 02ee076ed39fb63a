import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { api, unwrap } from '@/lib/api-client';

export const acceptInvitationInputSchema = z
  .object({
    password: z.string().min(10, 'Use at least 10 characters.').max(200),
    confirm: z.string(),
  })
  .refine((v) => v.password === v.confirm, { path: ['confirm'], message: 'The two passwords differ.' });
export type AcceptInvitationInput = z.infer<typeof acceptInvitationInputSchema>;

export async function acceptInvitation(token: string, input: AcceptInvitationInput) {
  return unwrap(
    await api.POST('/api/invitations/{token}/accept', {
      params: { path: { token } },
      body: { password: input.password },
    }),
  );
}

export function useAcceptInvitation(token: string) {
  return useMutation({ mutationFn: (input: AcceptInvitationInput) => acceptInvitation(token, input) });
}

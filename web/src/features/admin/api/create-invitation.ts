import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api, unwrap } from '@/lib/api-client';
import { notify } from '@/lib/notify';

export const createInvitationInputSchema = z.object({
  email: z.email('Enter an e-mail address.'),
  name: z.string().trim().min(1, 'Enter their name.').max(200),
  role: z.enum(['admin', 'consultant', 'checker', 'owner-rep']),
  organisationId: z.number().int().positive().optional(),
});
export type CreateInvitationInput = z.infer<typeof createInvitationInputSchema>;

export async function createInvitation(input: CreateInvitationInput) {
  return unwrap(await api.POST('/api/invitations', { body: input }));
}

export function useCreateInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createInvitation,
    onSuccess: (invitation) => {
      void queryClient.invalidateQueries({ queryKey: ['invitations'] });
      void queryClient.invalidateQueries({ queryKey: ['mailbox'] });
      notify({
        intent: 'success',
        title: 'Invitation sent',
        body: `A one-time link is on its way to ${invitation.email}.`,
      });
    },
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';
import { notify } from '@/lib/notify';

/** Sends an invitation again with a new link; the API answers the invitation that replaces it. */
export async function resendInvitation(invitationId: number) {
  return unwrap(
    await api.POST('/api/invitations/{invitationId}/resend', { params: { path: { invitationId } } }),
  );
}

export function useResendInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: resendInvitation,
    onSuccess: (invitation) => {
      void queryClient.invalidateQueries({ queryKey: ['invitations'] });
      void queryClient.invalidateQueries({ queryKey: ['mailbox'] });
      notify({
        intent: 'success',
        title: 'Invitation sent again',
        body: `A new link is on its way to ${invitation.email}; the one sent before no longer works.`,
      });
    },
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';
import { notify } from '@/lib/notify';

/** Withdraws an invitation: the link in its e-mail stops working. */
export async function revokeInvitation(invitationId: number) {
  return unwrap(
    await api.POST('/api/invitations/{invitationId}/revoke', { params: { path: { invitationId } } }),
  );
}

export function useRevokeInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeInvitation,
    onSuccess: (invitation) => {
      void queryClient.invalidateQueries({ queryKey: ['invitations'] });
      notify({
        intent: 'success',
        title: 'Invitation revoked',
        body: `The link sent to ${invitation.email} no longer works.`,
      });
    },
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';
import { notify } from '@/lib/notify';

export async function revokeToken(tokenId: number) {
  return unwrap(await api.DELETE('/api/tokens/{tokenId}', { params: { path: { tokenId } } }));
}

export function useRevokeToken() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeToken,
    onSuccess: (token) => {
      void queryClient.invalidateQueries({ queryKey: ['tokens'] });
      notify({
        intent: 'success',
        title: 'Token revoked',
        body: `${token.name} (${token.prefix}…) stops working now.`,
      });
    },
  });
}

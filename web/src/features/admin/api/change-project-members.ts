import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export async function addProjectMember(projectId: number, userId: number) {
  return unwrap(
    await api.POST('/api/projects/{projectId}/members', {
      params: { path: { projectId } },
      body: { userId },
    }),
  );
}

export async function removeProjectMember(projectId: number, userId: number) {
  return unwrap(
    await api.DELETE('/api/projects/{projectId}/members/{userId}', {
      params: { path: { projectId, userId } },
    }),
  );
}

export function useChangeProjectMembers(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, change }: { userId: number; change: 'add' | 'remove' }) =>
      change === 'add' ? addProjectMember(projectId, userId) : removeProjectMember(projectId, userId),
    onSuccess: (members) => queryClient.setQueryData(['projects', projectId, 'members'], members),
  });
}

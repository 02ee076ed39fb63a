import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api, unwrap } from '@/lib/api-client';

export const createProjectInputSchema = z.object({
  name: z.string().trim().min(1, 'Name the project.').max(200),
  reference: z.string().trim().max(60).optional(),
  description: z.string().trim().max(2000).optional(),
  ownerOrganisationId: z.number().int().positive().optional(),
});
export type CreateProjectInput = z.infer<typeof createProjectInputSchema>;

export async function createProject(input: CreateProjectInput) {
  const body = Object.fromEntries(
    Object.entries(input).filter(([, v]) => v !== undefined && v !== ''),
  ) as CreateProjectInput;
  return unwrap(await api.POST('/api/projects', { body }));
}

export function useCreateProject() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createProject,
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: ['projects'] }),
  });
}

import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '@/lib/api-client';

export async function getOrganisations() {
  return unwrap(await api.GET('/api/organisations'));
}

export const getOrganisationsQueryOptions = () =>
  queryOptions({ queryKey: ['organisations'], queryFn: getOrganisations });

export function useOrganisations() {
  return useQuery(getOrganisationsQueryOptions());
}

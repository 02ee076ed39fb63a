import { useMutation } from '@tanstack/react-query';
import { describeError } from '@/lib/api-error';
import { downloadFromApi } from '@/lib/download';
import { notify } from '@/lib/notify';
import { discrepancyQuery, type DiscrepancyFilters } from './get-discrepancies';

/**
 * Every discrepancy the list's filters match (all pages, in the list's order) as the CSV the API
 * builds: UTF-8 with a byte-order mark, the numbers with their quantity, unit and unit system.
 */
export function downloadDiscrepanciesCsv(projectId: number, filters: DiscrepancyFilters): Promise<number> {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(discrepancyQuery(filters)))
    if (value !== undefined && value !== '') search.set(key, String(value));
  const tag = `project-${projectId}${filters.submittalId ? `-submittal-${filters.submittalId}` : ''}`;
  return downloadFromApi(
    `/api/projects/${projectId}/discrepancies.csv?${search.toString()}`,
    `discrepancies-${tag}-${new Date().toISOString().slice(0, 10)}.csv`,
  );
}

export function useDownloadDiscrepanciesCsv(projectId: number | undefined, filters: DiscrepancyFilters) {
  return useMutation({
    mutationFn: () => downloadDiscrepanciesCsv(projectId ?? 0, filters),
    onError: (error) =>
      notify({ intent: 'error', title: 'The export did not finish', body: describeError(error) }),
  });
}

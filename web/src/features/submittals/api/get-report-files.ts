import { useQueries } from '@tanstack/react-query';
import { getCalcFileQueryOptions } from './get-calc-file';

/** Every calc file of a submittal with its document, for the printed report. */
export function useReportFiles(fileIds: readonly number[]) {
  return useQueries({
    queries: fileIds.map((id) => getCalcFileQueryOptions(id)),
    combine: (results) => ({
      data: results.every((r) => r.isSuccess) ? results.map((r) => r.data!) : undefined,
      isPending: results.some((r) => r.isPending),
      error: results.find((r) => r.isError)?.error ?? null,
    }),
  });
}

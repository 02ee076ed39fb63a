import { useMutation } from '@tanstack/react-query';
import { describeError } from '@/lib/api-error';
import { downloadFromApi } from '@/lib/download';
import { notify } from '@/lib/notify';

/** Every current open discrepancy of the user's projects, as the CSV the API builds. */
export function downloadOpenCsv(): Promise<number> {
  return downloadFromApi(
    '/api/dashboard/open-discrepancies.csv',
    `open-discrepancies-${new Date().toISOString().slice(0, 10)}.csv`,
  );
}

export function useDownloadOpenCsv() {
  return useMutation({
    mutationFn: downloadOpenCsv,
    onError: (error) => notify({ intent: 'error', title: 'The export failed', body: describeError(error) }),
  });
}

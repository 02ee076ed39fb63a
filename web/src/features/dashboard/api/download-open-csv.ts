import { useMutation } from '@tanstack/react-query';
import { apiUrl, authHeaders } from '@/lib/api-client';
import { toApiError } from '@/lib/api-error';
import { notify } from '@/lib/notify';

/** Fetches the CSV with the session's token and hands it to the browser as a download. */
export async function downloadOpenCsv(): Promise<number> {
  const response = await fetch(apiUrl('/api/dashboard/open-discrepancies.csv'), { headers: authHeaders() });
  if (!response.ok)
    throw toApiError(response.status, response.statusText, await response.json().catch(() => null));
  const blob = await response.blob();
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = `open-discrepancies-${new Date().toISOString().slice(0, 10)}.csv`;
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
  return blob.size;
}

export function useDownloadOpenCsv() {
  return useMutation({
    mutationFn: downloadOpenCsv,
    onError: (error) => notify({ intent: 'error', title: 'The export failed', body: error.message }),
  });
}

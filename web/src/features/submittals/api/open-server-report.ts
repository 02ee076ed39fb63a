import { useMutation } from '@tanstack/react-query';
import { apiUrl, authHeaders } from '@/lib/api-client';
import { toApiError } from '@/lib/api-error';
import { notify } from '@/lib/notify';

/** The server's own HTML review report, fetched with the session's token and opened in a new tab. */
export async function openServerReport(submittalId: number): Promise<void> {
  const response = await fetch(apiUrl(`/api/submittals/${submittalId}/report`), {
    headers: await authHeaders(),
  });
  if (!response.ok)
    throw toApiError(response.status, response.statusText, await response.json().catch(() => null));
  const url = URL.createObjectURL(await response.blob());
  window.open(url, '_blank', 'noopener');
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
}

export function useOpenServerReport() {
  return useMutation({
    mutationFn: openServerReport,
    onError: (error) =>
      notify({ intent: 'error', title: 'The report could not be opened', body: error.message }),
  });
}

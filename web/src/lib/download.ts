import { apiUrl, authHeaders } from './api-client';
import { toApiError } from './api-error';

/** Hands bytes to the browser as a file download. */
export function saveBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

/**
 * Fetches a file the API serves (a CSV export) with the session's token, and saves it under
 * `fileName`. Returns its size in bytes; a refusal becomes an ApiError in the user's words.
 */
export async function downloadFromApi(path: string, fileName: string): Promise<number> {
  const response = await fetch(apiUrl(path), { headers: await authHeaders() });
  if (!response.ok)
    throw toApiError(response.status, response.statusText, await response.json().catch(() => null));
  const blob = await response.blob();
  saveBlob(blob, fileName);
  return blob.size;
}

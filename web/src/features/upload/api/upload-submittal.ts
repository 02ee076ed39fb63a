import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiUrl, authHeaders } from '@/lib/api-client';
import { ApiError, toApiError } from '@/lib/api-error';
import type { Schema } from '@/lib/api-schemas';
import { notify } from '@/lib/notify';
import { sessionStore } from '@/lib/session';

export const uploadInputSchema = z.object({
  title: z.string().trim().min(1, 'Give the submittal a title.').max(200),
  revisionOf: z.number().int().positive().optional(),
  files: z.array(z.instanceof(File)).min(1, 'Add at least one calc file.'),
});
export type UploadInput = z.infer<typeof uploadInputSchema>;
export type UploadResult = Schema<'UploadResultDto'>;

/**
 * Sends the files as multipart/form-data. XMLHttpRequest rather than fetch: only it reports upload
 * progress, which the progress bar shows. Errors come back in the API's own shape.
 */
export function uploadSubmittal(
  projectId: number,
  input: UploadInput,
  onProgress: (fraction: number) => void,
): Promise<UploadResult> {
  const form = new FormData();
  form.append('title', input.title);
  if (input.revisionOf !== undefined) form.append('revisionOf', String(input.revisionOf));
  for (const file of input.files) form.append('files', file, file.name);

  return authHeaders().then((headers) => send(projectId, form, headers, onProgress));
}

function send(
  projectId: number,
  form: FormData,
  headers: Record<string, string>,
  onProgress: (fraction: number) => void,
): Promise<UploadResult> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', apiUrl(`/api/projects/${projectId}/submittals`));
    for (const [name, value] of Object.entries(headers)) xhr.setRequestHeader(name, value);
    xhr.responseType = 'json';
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) onProgress(event.loaded / event.total);
    };
    xhr.onload = () => {
      if (xhr.status >= 200 && xhr.status < 300) {
        onProgress(1);
        resolve(xhr.response as UploadResult);
        return;
      }
      const error = toApiError(xhr.status, xhr.statusText, xhr.response);
      if (xhr.status === 401) sessionStore.clear();
      reject(error);
    };
    xhr.onerror = () => reject(new TypeError('network'));
    xhr.send(form);
  });
}

export function useUploadSubmittal(projectId: number, onProgress: (fraction: number) => void) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UploadInput) => uploadSubmittal(projectId, input, onProgress),
    onSuccess: (result) => {
      void queryClient.invalidateQueries({ queryKey: ['projects'] });
      void queryClient.invalidateQueries({ queryKey: ['discrepancies', projectId] });
      void queryClient.invalidateQueries({ queryKey: ['dashboard'] });
      notify({
        intent: 'success',
        title: 'Submittal checked',
        body: `${result.summary.findings} findings in ${result.summary.members} members.`,
      });
    },
    onError: (error) => {
      if (error instanceof ApiError && error.statusCode !== 422)
        notify({ intent: 'error', title: error.error, body: error.message });
    },
  });
}

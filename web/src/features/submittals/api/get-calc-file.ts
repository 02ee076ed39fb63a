import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CalcDocument } from 'ligament/calc';
import { api, unwrap } from '@/lib/api-client';

/** One calc file with its normalised document (typed with the ligament package's CalcDocument). */
export async function getCalcFile(fileId: number) {
  const file = unwrap(await api.GET('/api/calc-files/{fileId}', { params: { path: { fileId } } }));
  return { ...file, document: file.document as unknown as CalcDocument };
}

export const getCalcFileQueryOptions = (fileId: number) =>
  queryOptions({ queryKey: ['calc-files', fileId], queryFn: () => getCalcFile(fileId), staleTime: Infinity });

export function useCalcFile(fileId: number | undefined) {
  return useQuery({ ...getCalcFileQueryOptions(fileId ?? 0), enabled: fileId !== undefined });
}

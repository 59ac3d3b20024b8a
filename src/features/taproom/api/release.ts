import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { PublishReleaseInput, ReleaseDetail, ReleaseSheet } from '../../../../shared/schemas/taproom';
import { taproomKeys } from './keys';

export const releaseQuery = (batchId: number) =>
  queryOptions({
    queryKey: taproomKeys.release(batchId),
    queryFn: () => api.get<ReleaseDetail>(`/api/batches/${batchId}/release`),
  });
export const useRelease = (batchId: number) => useQuery(releaseQuery(batchId));

/** Saving or releasing changes what the taproom and the batch screens show: refresh both. */
function useInvalidateAfterRelease() {
  const client = useQueryClient();
  return () =>
    Promise.all([
      client.invalidateQueries({ queryKey: taproomKeys.all }),
      client.invalidateQueries({ queryKey: ['batches'] }),
    ]);
}

export function useSaveReleaseSheet(batchId: number) {
  const invalidate = useInvalidateAfterRelease();
  return useMutation({
    mutationFn: (sheet: ReleaseSheet) => api.put<ReleaseDetail>(`/api/batches/${batchId}/release`, sheet),
    onSuccess: invalidate,
  });
}

export function usePublishRelease(batchId: number) {
  const invalidate = useInvalidateAfterRelease();
  return useMutation({
    mutationFn: (input: PublishReleaseInput) =>
      api.post<ReleaseDetail>(`/api/batches/${batchId}/release/publish`, input),
    onSuccess: invalidate,
  });
}

/** Takes the beer off tap (it has run out), or puts a beer taken off tap back on. */
export function useSetOnTap(batchId: number) {
  const invalidate = useInvalidateAfterRelease();
  return useMutation({
    mutationFn: (onTap: boolean) =>
      api.post<ReleaseDetail>(`/api/batches/${batchId}/release/${onTap ? 'back-on-tap' : 'off-tap'}`),
    onSuccess: invalidate,
  });
}

import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { releaseRoutes } from '../../../../shared/contract/taproom';
import type { PublishReleaseInput, ReleaseSheet } from '../../../../shared/schemas/taproom';
import { taproomKeys } from './keys';

export const releaseQuery = (batchId: number) =>
  queryOptions({
    queryKey: taproomKeys.release(batchId),
    queryFn: () => call(releaseRoutes.get, { params: { batchId } }),
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
    mutationFn: (sheet: ReleaseSheet) => call(releaseRoutes.saveSheet, { params: { batchId }, body: sheet }),
    onSuccess: invalidate,
  });
}

export function usePublishRelease(batchId: number) {
  const invalidate = useInvalidateAfterRelease();
  return useMutation({
    mutationFn: (input: PublishReleaseInput) => call(releaseRoutes.publish, { params: { batchId }, body: input }),
    onSuccess: invalidate,
  });
}

/** Takes the beer off tap (it has run out), or puts a beer taken off tap back on. */
export function useSetOnTap(batchId: number) {
  const invalidate = useInvalidateAfterRelease();
  return useMutation({
    mutationFn: (onTap: boolean) =>
      call(onTap ? releaseRoutes.backOnTap : releaseRoutes.offTap, { params: { batchId } }),
    onSuccess: invalidate,
  });
}

import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { tastingRoutes } from '../../../../shared/contract/tasting';
import type { TastingNoteInput } from '../../../../shared/schemas/tasting';

export const tastingKeys = {
  all: ['tasting'] as const,
  batch: (batchId: number) => [...tastingKeys.all, batchId] as const,
};

export const tastingNotesQuery = (batchId: number) =>
  queryOptions({
    queryKey: tastingKeys.batch(batchId),
    queryFn: () => call(tastingRoutes.list, { params: { batchId } }),
  });
export const useTastingNotes = (batchId: number) => useQuery(tastingNotesQuery(batchId));

export function useAddTastingNote(batchId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: TastingNoteInput) => call(tastingRoutes.add, { params: { batchId }, body: input }),
    // The taproom's tasting summary changes too.
    onSuccess: () =>
      Promise.all([
        client.invalidateQueries({ queryKey: tastingKeys.batch(batchId) }),
        client.invalidateQueries({ queryKey: ['taproom'] }),
      ]),
  });
}

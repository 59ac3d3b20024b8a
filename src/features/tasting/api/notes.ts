import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { TastingNote, TastingNoteInput } from '../../../../shared/schemas/tasting';

export const tastingKeys = {
  all: ['tasting'] as const,
  batch: (batchId: number) => [...tastingKeys.all, batchId] as const,
};

export const tastingNotesQuery = (batchId: number) =>
  queryOptions({
    queryKey: tastingKeys.batch(batchId),
    queryFn: () => api.get<TastingNote[]>(`/api/batches/${batchId}/tasting-notes`),
  });
export const useTastingNotes = (batchId: number) => useQuery(tastingNotesQuery(batchId));

export function useAddTastingNote(batchId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: TastingNoteInput) => api.post<TastingNote>(`/api/batches/${batchId}/tasting-notes`, input),
    // The taproom's tasting summary changes too.
    onSuccess: () =>
      Promise.all([
        client.invalidateQueries({ queryKey: tastingKeys.batch(batchId) }),
        client.invalidateQueries({ queryKey: ['taproom'] }),
      ]),
  });
}

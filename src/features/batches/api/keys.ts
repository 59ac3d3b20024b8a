import type { BatchListQuery } from '../../../../shared/schemas/batches';

/** Query keys for batches, general to specific, so a write invalidates by prefix. */
export const batchKeys = {
  all: ['batches'] as const,
  lists: () => [...batchKeys.all, 'list'] as const,
  list: (query: Partial<BatchListQuery>) => [...batchKeys.lists(), query] as const,
  detail: (id: number) => [...batchKeys.all, 'detail', id] as const,
};

import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { BatchList, BatchListQuery } from '../../../../shared/schemas/batches';
import { batchKeys } from './keys';

export const batchListQuery = (query: Partial<BatchListQuery>) =>
  queryOptions({
    queryKey: batchKeys.list(query),
    queryFn: () => {
      const params = new URLSearchParams(
        Object.entries(query)
          .filter(([, v]) => v !== undefined)
          .map(([k, v]) => [k, String(v)]),
      );
      return api.get<BatchList>(`/api/batches${params.size ? `?${params}` : ''}`);
    },
    placeholderData: keepPreviousData,
  });
export const useBatchList = (query: Partial<BatchListQuery>) => useQuery(batchListQuery(query));

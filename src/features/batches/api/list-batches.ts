import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { batchRoutes } from '../../../../shared/contract/batches';
import type { BatchListQuery } from '../../../../shared/schemas/batches';
import { batchKeys } from './keys';

export const batchListQuery = (query: Partial<BatchListQuery>) =>
  queryOptions({
    queryKey: batchKeys.list(query),
    queryFn: () => call(batchRoutes.list, { query }),
    placeholderData: keepPreviousData,
  });
export const useBatchList = (query: Partial<BatchListQuery>) => useQuery(batchListQuery(query));

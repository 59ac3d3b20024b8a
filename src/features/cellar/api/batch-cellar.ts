import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { BatchCellarView } from '../../../../shared/schemas/cellar';
import { cellarKeys } from './keys';

export const batchCellarQuery = (batchId: number) =>
  queryOptions({
    queryKey: cellarKeys.batch(batchId),
    queryFn: () => api.get<BatchCellarView>(`/api/cellar/batches/${batchId}`),
  });

export const useBatchCellar = (batchId: number) => useQuery(batchCellarQuery(batchId));

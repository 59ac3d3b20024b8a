import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { BatchDetail } from '../../../../shared/schemas/batches';
import { batchKeys } from './keys';

export const batchQuery = (id: number) =>
  queryOptions({ queryKey: batchKeys.detail(id), queryFn: () => api.get<BatchDetail>(`/api/batches/${id}`) });
export const useBatch = (id: number) => useQuery(batchQuery(id));

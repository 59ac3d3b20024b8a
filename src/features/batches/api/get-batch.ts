import { queryOptions, useQuery } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { batchRoutes } from '../../../../shared/contract/batches';
import { batchKeys } from './keys';

export const batchQuery = (id: number) =>
  queryOptions({ queryKey: batchKeys.detail(id), queryFn: () => call(batchRoutes.get, { params: { id } }) });
export const useBatch = (id: number) => useQuery(batchQuery(id));

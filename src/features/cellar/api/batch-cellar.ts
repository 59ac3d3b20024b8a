import { queryOptions, useQuery } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { cellarRoutes } from '../../../../shared/contract/cellar';
import { cellarKeys } from '../../../lib/cellar-keys';

export const batchCellarQuery = (batchId: number) =>
  queryOptions({
    queryKey: cellarKeys.batch(batchId),
    queryFn: () => call(cellarRoutes.batch, { params: { batchId } }),
  });

export const useBatchCellar = (batchId: number) => useQuery(batchCellarQuery(batchId));

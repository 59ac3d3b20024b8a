import { queryOptions, useQuery } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { vesselRoutes } from '../../../../shared/contract/cellar';
import { batchKeys } from './keys';

/** Fermenters that hold no batch, largest first: where a planned batch can go (some may still need cleaning). */
export const freeFermentersQuery = () =>
  queryOptions({
    queryKey: [...batchKeys.all, 'free-fermenters'] as const,
    queryFn: async () =>
      (await call(vesselRoutes.list))
        .filter((v) => v.type === 'fermenter' && v.currentBatchId === null)
        .sort((a, b) => b.capacityL - a.capacityL || a.name.localeCompare(b.name)),
  });
export const useFreeFermenters = () => useQuery(freeFermentersQuery());

import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { VesselView } from '../../../../shared/schemas/cellar';
import { batchKeys } from './keys';

/** Fermenters that hold no batch, largest first: where a planned batch can go (some may still need cleaning). */
export const freeFermentersQuery = () =>
  queryOptions({
    queryKey: [...batchKeys.all, 'free-fermenters'] as const,
    queryFn: async () =>
      (await api.get<VesselView[]>('/api/vessels'))
        .filter((v) => v.type === 'fermenter' && v.currentBatchId === null)
        .sort((a, b) => b.capacityL - a.capacityL || a.name.localeCompare(b.name)),
  });
export const useFreeFermenters = () => useQuery(freeFermentersQuery());

import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { VesselView } from '../../../../shared/schemas/cellar';
import { batchKeys } from './keys';

/** Fermenters that hold no batch: where a planned batch can go. */
export const freeFermentersQuery = () =>
  queryOptions({
    queryKey: [...batchKeys.all, 'free-fermenters'] as const,
    queryFn: async () => (await api.get<VesselView[]>('/api/vessels')).filter((v) => v.type === 'fermenter' && v.currentBatchId === null),
  });
export const useFreeFermenters = () => useQuery(freeFermentersQuery());

import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { ReleaseState } from '../../../../shared/schemas/taproom';
import { taproomKeys } from './keys';

export interface ReleaseCandidate {
  batchId: number;
  number: string;
  beerName: string;
  status: string;
  state: ReleaseState | null;
}

export const releasesQuery = () =>
  queryOptions({
    queryKey: taproomKeys.releases(),
    queryFn: () => api.get<ReleaseCandidate[]>('/api/taproom/releases'),
  });
export const useReleases = () => useQuery(releasesQuery());

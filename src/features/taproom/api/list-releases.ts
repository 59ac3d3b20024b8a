import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { ReleaseCandidate } from '../../../../shared/contract/taproom';
import { taproomKeys } from './keys';

export const releasesQuery = () =>
  queryOptions({
    queryKey: taproomKeys.releases(),
    queryFn: () => api.get<ReleaseCandidate[]>('/api/taproom/releases'),
  });
export const useReleases = () => useQuery(releasesQuery());

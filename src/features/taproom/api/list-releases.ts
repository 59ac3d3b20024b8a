import { queryOptions, useQuery } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { taproomRoutes } from '../../../../shared/contract/taproom';
import { taproomKeys } from './keys';

export const releasesQuery = () =>
  queryOptions({
    queryKey: taproomKeys.releases(),
    queryFn: () => call(taproomRoutes.releases),
  });
export const useReleases = () => useQuery(releasesQuery());

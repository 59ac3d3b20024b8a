import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import type { TaproomListQuery } from '../../../../shared/schemas/taproom';
import { taproomRoutes } from '../../../../shared/contract/taproom';
import { taproomKeys } from './keys';

export const beersQuery = (query: TaproomListQuery) =>
  queryOptions({
    queryKey: taproomKeys.beerList(query),
    queryFn: () => call(taproomRoutes.beers, { query }),
    placeholderData: keepPreviousData,
  });
export const useBeers = (query: TaproomListQuery) => useQuery(beersQuery(query));

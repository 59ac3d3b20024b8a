import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { TaproomBeer, TaproomListQuery } from '../../../../shared/schemas/taproom';
import { taproomKeys } from './keys';

export interface BeerList {
  beers: TaproomBeer[];
  styles: string[];
}

function search(query: TaproomListQuery): string {
  const params = new URLSearchParams(Object.entries(query).filter(([, v]) => v) as [string, string][]);
  return params.size ? `?${params}` : '';
}

export const beersQuery = (query: TaproomListQuery) =>
  queryOptions({
    queryKey: taproomKeys.beerList(query),
    queryFn: () => api.get<BeerList>(`/api/taproom/beers${search(query)}`),
    placeholderData: keepPreviousData,
  });
export const useBeers = (query: TaproomListQuery) => useQuery(beersQuery(query));

import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { TaproomListQuery } from '../../../../shared/schemas/taproom';
import type { BeerList } from '../../../../shared/contract/taproom';
import { taproomKeys } from './keys';

function search(query: TaproomListQuery): string {
  const params = new URLSearchParams(
    Object.entries(query).filter((entry): entry is [string, string] => typeof entry[1] === 'string' && entry[1] !== ''),
  );
  return params.size ? `?${params}` : '';
}

export const beersQuery = (query: TaproomListQuery) =>
  queryOptions({
    queryKey: taproomKeys.beerList(query),
    queryFn: () => api.get<BeerList>(`/api/taproom/beers${search(query)}`),
    placeholderData: keepPreviousData,
  });
export const useBeers = (query: TaproomListQuery) => useQuery(beersQuery(query));

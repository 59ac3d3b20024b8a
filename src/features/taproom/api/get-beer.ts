import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { TaproomBeer } from '../../../../shared/schemas/taproom';
import { taproomKeys } from './keys';

export const beerQuery = (id: number) =>
  queryOptions({ queryKey: taproomKeys.beer(id), queryFn: () => api.get<TaproomBeer>(`/api/taproom/beers/${id}`) });
export const useBeer = (id: number) => useQuery(beerQuery(id));

import { queryOptions, useQuery } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { taproomRoutes } from '../../../../shared/contract/taproom';
import { taproomKeys } from './keys';

export const beerQuery = (id: number) =>
  queryOptions({ queryKey: taproomKeys.beer(id), queryFn: () => call(taproomRoutes.beer, { params: { beerId: id } }) });
export const useBeer = (id: number) => useQuery(beerQuery(id));

import { queryOptions, useQuery } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { cellarRoutes } from '../../../../shared/contract/cellar';
import { cellarKeys } from '../../../lib/cellar-keys';

export const boardQuery = () =>
  queryOptions({
    queryKey: cellarKeys.board(),
    queryFn: () => call(cellarRoutes.board),
    // A wall screen: keep it current without anyone touching it.
    refetchInterval: 60_000,
  });

export const useBoard = () => useQuery(boardQuery());

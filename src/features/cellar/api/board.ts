import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { BoardVessel } from '../../../../shared/schemas/cellar';
import { cellarKeys } from './keys';

export const boardQuery = () =>
  queryOptions({
    queryKey: cellarKeys.board(),
    queryFn: () => api.get<BoardVessel[]>('/api/cellar/board'),
    // A wall screen: keep it current without anyone touching it.
    refetchInterval: 60_000,
  });

export const useBoard = () => useQuery(boardQuery());

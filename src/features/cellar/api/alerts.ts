import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { AlertView } from '../../../../shared/schemas/cellar';
import { cellarKeys } from './keys';

export const alertsQuery = () =>
  queryOptions({
    queryKey: cellarKeys.alerts(),
    queryFn: () => api.get<AlertView[]>('/api/cellar/alerts'),
    refetchInterval: 60_000,
  });
export const useAlerts = (enabled: boolean) => useQuery({ ...alertsQuery(), enabled });

export function useMarkAlertRead() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.post(`/api/cellar/alerts/${id}/read`),
    onSuccess: () => client.invalidateQueries({ queryKey: cellarKeys.alerts() }),
  });
}

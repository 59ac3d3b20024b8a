import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { cellarRoutes } from '../../../../shared/contract/cellar';
import { cellarKeys } from '../../../lib/cellar-keys';

export const alertsQuery = () =>
  queryOptions({
    queryKey: cellarKeys.alerts(),
    queryFn: () => call(cellarRoutes.alerts),
    refetchInterval: 60_000,
  });
export const useAlerts = (enabled: boolean) => useQuery({ ...alertsQuery(), enabled });

export function useMarkAlertRead() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => call(cellarRoutes.markAlertRead, { params: { alertId: id } }),
    onSuccess: () => client.invalidateQueries({ queryKey: cellarKeys.alerts() }),
  });
}

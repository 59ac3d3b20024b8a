import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { ProductionReport } from '../../../../shared/schemas/reports';
import { reportKeys } from './keys';

export const productionQuery = (month: string) =>
  queryOptions({
    queryKey: reportKeys.production(month),
    queryFn: () => api.get<ProductionReport>(`/api/reports/production?month=${encodeURIComponent(month)}`),
  });
export const useProductionReport = (month: string) => useQuery(productionQuery(month));

/** The same figures as CSV (a plain download link: the browser sends the session cookie). */
export const productionCsvUrl = (month: string) => `/api/reports/production/csv?month=${encodeURIComponent(month)}`;

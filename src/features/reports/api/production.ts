import { queryOptions, useQuery } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { reportRoutes } from '../../../../shared/contract/reports';
import { reportKeys } from './keys';

export const productionQuery = (month: string) =>
  queryOptions({
    queryKey: reportKeys.production(month),
    queryFn: () => call(reportRoutes.production, { query: { month } }),
  });
export const useProductionReport = (month: string) => useQuery(productionQuery(month));

/** The same figures as CSV (a plain download link: the browser sends the session cookie). */
export const productionCsvUrl = (month: string) =>
  `${reportRoutes.productionCsv.path}?${new URLSearchParams({ month })}`;

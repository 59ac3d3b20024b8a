import { queryOptions, useQuery } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import type { CarbonationQuery } from '../../../../shared/schemas/cellar';
import { cellarRoutes } from '../../../../shared/contract/cellar';
import { cellarKeys } from '../../../lib/cellar-keys';

export const carbonationQuery = (query: CarbonationQuery) =>
  queryOptions({
    queryKey: cellarKeys.carbonation(query),
    queryFn: () => call(cellarRoutes.carbonation, { query }),
    retry: false,
  });

export const useCarbonation = (query: CarbonationQuery | null) =>
  useQuery({
    ...carbonationQuery(query ?? { vesselId: 0, co2Volumes: 0, temp: 0, tempUnit: 'c' }),
    enabled: query !== null,
  });

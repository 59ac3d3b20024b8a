import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { CarbonationQuery } from '../../../../shared/schemas/cellar';
import type { CarbonationAnswer } from '../../../../shared/contract/cellar';
import { cellarKeys } from './keys';

export const carbonationQuery = (query: CarbonationQuery) =>
  queryOptions({
    queryKey: cellarKeys.carbonation(query),
    queryFn: () =>
      api.get<CarbonationAnswer>(
        `/api/cellar/carbonation?${new URLSearchParams(Object.entries(query).map(([k, v]) => [k, String(v)]))}`,
      ),
    retry: false,
  });

export const useCarbonation = (query: CarbonationQuery | null) =>
  useQuery({
    ...carbonationQuery(query ?? { vesselId: 0, co2Volumes: 0, temp: 0, tempUnit: 'c' }),
    enabled: query !== null,
  });

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { breweryRoutes } from '../../../../shared/contract/auth';
import type { BrewerySettingsInput } from '../../../../shared/schemas/auth';
import { authKeys } from '../../../lib/current-user';

export function useUpdateBrewery() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: BrewerySettingsInput) => call(breweryRoutes.update, { body: input }),
    // The brewery's name, units and time zone travel with the signed-in person.
    onSuccess: () => client.invalidateQueries({ queryKey: authKeys.me() }),
  });
}

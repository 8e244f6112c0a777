import { useMutation, useQueryClient } from '@tanstack/react-query';
import { client, ifMatch, unwrap } from '../../api/client';
import type { FuelPricesInput } from '../../api/types';
import type { VersionedSave } from '../../components/save-conflict';
import { fuelPriceKeys, seasonKeys } from '../../api/query-keys';

/** Season results (keys under 'season') are priced with these: they recompute after a change. */

export function usePutFuelPrices(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, version }: VersionedSave<FuelPricesInput>) =>
      unwrap(
        client.PUT('/api/farms/{farmId}/fuel-prices', { params: { path: { farmId }, header: ifMatch(version) }, body }),
      ),
    onSuccess: (saved) => {
      queryClient.setQueryData(fuelPriceKeys.farm(farmId), saved);
      void queryClient.invalidateQueries({ queryKey: seasonKeys.all });
    },
  });
}

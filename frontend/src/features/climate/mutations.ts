import { useMutation, useQueryClient } from '@tanstack/react-query';
import { client, ifMatch, unwrap } from '../../api/client';
import type { SiteClimate } from '../../api/types';
import type { VersionedSave } from '../../components/save-conflict';
import { climateKeys, estimateKeys, seasonKeys } from '../../api/query-keys';

export function usePutFarmClimate(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, version }: VersionedSave<SiteClimate>) =>
      unwrap(
        client.PUT('/api/farms/{farmId}/climate', { params: { path: { farmId }, header: ifMatch(version) }, body }),
      ),
    onSuccess: (saved) => {
      queryClient.setQueryData(climateKeys.farm(farmId), saved);
      // Season and estimate results read the farm climate: let them recompute.
      void queryClient.invalidateQueries({ queryKey: seasonKeys.all });
      void queryClient.invalidateQueries({ queryKey: estimateKeys.all });
    },
  });
}

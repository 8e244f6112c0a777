import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { FarmClimate, SiteClimate } from '../../api/types';
import type { VersionedSave } from '../../components/save-conflict';
import { climateKeys, estimateKeys, seasonKeys } from '../../api/query-keys';

export function usePutFarmClimate(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, version }: VersionedSave<SiteClimate>) =>
      api.put<FarmClimate>(`/api/farms/${farmId}/climate`, body, { ifMatch: version }),
    onSuccess: (saved) => {
      queryClient.setQueryData(climateKeys.farm(farmId), saved);
      // Season and estimate results read the farm climate: let them recompute.
      void queryClient.invalidateQueries({ queryKey: seasonKeys.all });
      void queryClient.invalidateQueries({ queryKey: estimateKeys.all });
    },
  });
}

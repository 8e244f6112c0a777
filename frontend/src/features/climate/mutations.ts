import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { FarmClimate, SiteClimate } from '../../api/types';
import type { VersionedSave } from '../../components/save-conflict';
import { climateKeys } from './queries';

export function usePutFarmClimate(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, version }: VersionedSave<SiteClimate>) =>
      api.put<FarmClimate>(`/api/farms/${farmId}/climate`, body, { ifMatch: version }),
    onSuccess: (saved) => {
      queryClient.setQueryData(climateKeys.farm(farmId), saved);
      // Season and estimate results read the farm climate: let them recompute.
      void queryClient.invalidateQueries({ queryKey: ['season'] });
      void queryClient.invalidateQueries({ queryKey: ['estimates'] });
    },
  });
}

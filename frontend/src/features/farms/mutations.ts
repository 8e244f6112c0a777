import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { Farm, FarmInput } from '../../api/types';
import type { VersionedSave } from '../../components/save-conflict';
import { farmKeys } from '../../api/query-keys';

export function useCreateFarm() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: FarmInput) => api.post<Farm>('/api/farms', body),
    onSuccess: (farm) => {
      queryClient.setQueryData(farmKeys.detail(farm.id), farm);
      void queryClient.invalidateQueries({ queryKey: farmKeys.lists() });
    },
  });
}

export function useUpdateFarm(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, version }: VersionedSave<Partial<FarmInput>>) =>
      api.patch<Farm>(`/api/farms/${farmId}`, body, { ifMatch: version }),
    onSuccess: (farm) => {
      queryClient.setQueryData(farmKeys.detail(farm.id), farm);
      void queryClient.invalidateQueries({ queryKey: farmKeys.lists() });
    },
  });
}

export function useDeleteFarm() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (farmId: number) => api.delete(`/api/farms/${farmId}`),
    onSuccess: (_result, farmId) => {
      queryClient.removeQueries({ queryKey: farmKeys.detail(farmId) });
      void queryClient.invalidateQueries({ queryKey: farmKeys.lists() });
    },
  });
}

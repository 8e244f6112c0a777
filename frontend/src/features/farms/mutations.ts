import { useMutation, useQueryClient } from '@tanstack/react-query';
import { client, ifMatch, unwrap } from '../../api/client';
import type { FarmInput, FarmUpdate } from '../../api/types';
import type { VersionedSave } from '../../components/save-conflict';
import { farmKeys } from '../../api/query-keys';

export function useCreateFarm() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: FarmInput) => unwrap(client.POST('/api/farms', { body })),
    onSuccess: (farm) => {
      queryClient.setQueryData(farmKeys.detail(farm.id), farm);
      void queryClient.invalidateQueries({ queryKey: farmKeys.lists() });
    },
  });
}

export function useUpdateFarm(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, version }: VersionedSave<FarmUpdate>) =>
      unwrap(client.PATCH('/api/farms/{farmId}', { params: { path: { farmId }, header: ifMatch(version) }, body })),
    onSuccess: (farm) => {
      queryClient.setQueryData(farmKeys.detail(farm.id), farm);
      void queryClient.invalidateQueries({ queryKey: farmKeys.lists() });
    },
  });
}

export function useDeleteFarm() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (farmId: number) => unwrap(client.DELETE('/api/farms/{farmId}', { params: { path: { farmId } } })),
    onSuccess: (_result, farmId) => {
      queryClient.removeQueries({ queryKey: farmKeys.detail(farmId) });
      void queryClient.invalidateQueries({ queryKey: farmKeys.lists() });
    },
  });
}

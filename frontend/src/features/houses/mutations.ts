import { useMutation, useQueryClient } from '@tanstack/react-query';
import { client, ifMatch, unwrap } from '../../api/client';
import type { House, HouseInput, HouseUpdate } from '../../api/types';
import type { VersionedSave } from '../../components/save-conflict';
import { houseKeys } from '../../api/query-keys';

export function useCreateHouse(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: HouseInput) =>
      unwrap(client.POST('/api/farms/{farmId}/houses', { params: { path: { farmId } }, body })),
    onSuccess: (house) => {
      queryClient.setQueryData(houseKeys.detail(house.id), house);
      void queryClient.invalidateQueries({ queryKey: houseKeys.list(farmId) });
    },
  });
}

export function useUpdateHouse(houseId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, version }: VersionedSave<HouseUpdate>) =>
      unwrap(client.PATCH('/api/houses/{houseId}', { params: { path: { houseId }, header: ifMatch(version) }, body })),
    onSuccess: (house) => {
      queryClient.setQueryData(houseKeys.detail(house.id), house);
      void queryClient.invalidateQueries({ queryKey: houseKeys.list(house.farmId) });
    },
  });
}

export function useDeleteHouse() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (house: Pick<House, 'id' | 'farmId'>) =>
      unwrap(client.DELETE('/api/houses/{houseId}', { params: { path: { houseId: house.id } } })),
    onSuccess: (_result, house) => {
      queryClient.removeQueries({ queryKey: houseKeys.detail(house.id) });
      void queryClient.invalidateQueries({ queryKey: houseKeys.list(house.farmId) });
    },
  });
}

/** A copy of the house with its production calendar and alternatives. */
export function useDuplicateHouse(houseId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { name?: string }) =>
      unwrap(client.POST('/api/houses/{houseId}/duplicate', { params: { path: { houseId } }, body })),
    onSuccess: (house) => {
      queryClient.setQueryData(houseKeys.detail(house.id), house);
      void queryClient.invalidateQueries({ queryKey: houseKeys.list(house.farmId) });
    },
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { House, HouseInput } from '../../api/types';
import type { VersionedSave } from '../../components/save-conflict';
import { houseKeys } from '../../api/query-keys';

export function useCreateHouse(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: HouseInput) => api.post<House>(`/api/farms/${farmId}/houses`, body),
    onSuccess: (house) => {
      queryClient.setQueryData(houseKeys.detail(house.id), house);
      void queryClient.invalidateQueries({ queryKey: houseKeys.list(farmId) });
    },
  });
}

export function useUpdateHouse(houseId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, version }: VersionedSave<Partial<HouseInput>>) =>
      api.patch<House>(`/api/houses/${houseId}`, body, { ifMatch: version }),
    onSuccess: (house) => {
      queryClient.setQueryData(houseKeys.detail(house.id), house);
      void queryClient.invalidateQueries({ queryKey: houseKeys.list(house.farmId) });
    },
  });
}

export function useDeleteHouse() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (house: Pick<House, 'id' | 'farmId'>) => api.delete(`/api/houses/${house.id}`),
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
    mutationFn: (body: { name?: string }) => api.post<House>(`/api/houses/${houseId}/duplicate`, body),
    onSuccess: (house) => {
      queryClient.setQueryData(houseKeys.detail(house.id), house);
      void queryClient.invalidateQueries({ queryKey: houseKeys.list(house.farmId) });
    },
  });
}

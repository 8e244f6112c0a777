import { useMutation, useQueryClient } from '@tanstack/react-query';
import { client, unwrap } from '../../api/client';
import type { CreateAlternativeRequest, UpdateAlternativeRequest } from '../../api/types';
import { alternativeKeys } from '../../api/query-keys';

export function useCreateAlternative(houseId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateAlternativeRequest) =>
      unwrap(client.POST('/api/houses/{houseId}/alternatives', { params: { path: { houseId } }, body })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: alternativeKeys.all }),
  });
}

export function useUpdateAlternative() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, body }: { id: number; body: UpdateAlternativeRequest }) =>
      unwrap(client.PATCH('/api/alternatives/{alternativeId}', { params: { path: { alternativeId: id } }, body })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: alternativeKeys.all }),
  });
}

export function useDeleteAlternative() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) =>
      unwrap(client.DELETE('/api/alternatives/{alternativeId}', { params: { path: { alternativeId: id } } })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: alternativeKeys.all }),
  });
}

/** "Make this the house": the caller refreshes the house (its feature owns the house's cache). */
export function useAdoptAlternative() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) =>
      unwrap(client.POST('/api/alternatives/{alternativeId}/adopt', { params: { path: { alternativeId: id } } })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: alternativeKeys.all }),
  });
}

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../api/client';
import type {
  AdoptAlternativeResult,
  Alternative,
  CreateAlternativeRequest,
  UpdateAlternativeRequest,
} from '../../api/types';
import { alternativeKeys } from '../../api/query-keys';

export function useCreateAlternative(houseId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateAlternativeRequest) => api.post<Alternative>(`/api/houses/${houseId}/alternatives`, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: alternativeKeys.all }),
  });
}

export function useUpdateAlternative() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, body }: { id: number; body: UpdateAlternativeRequest }) =>
      api.patch<Alternative>(`/api/alternatives/${id}`, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: alternativeKeys.all }),
  });
}

export function useDeleteAlternative() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete(`/api/alternatives/${id}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: alternativeKeys.all }),
  });
}

/** "Make this the house": the caller refreshes the house (its feature owns the house's cache). */
export function useAdoptAlternative() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.post<AdoptAlternativeResult>(`/api/alternatives/${id}/adopt`, {}),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: alternativeKeys.all }),
  });
}

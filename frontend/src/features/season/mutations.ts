import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { ProductionCalendar, ProductionCalendarInput } from '../../api/types';
import type { VersionedSave } from '../../components/save-conflict';
import { seasonKeys } from '../../api/query-keys';

export function usePutProductionCalendar(houseId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, version }: VersionedSave<ProductionCalendarInput>) =>
      api.put<ProductionCalendar>(`/api/houses/${houseId}/calendar`, body, { ifMatch: version }),
    onSuccess: (saved) => {
      queryClient.setQueryData(seasonKeys.calendar(houseId), saved);
      // The house's season and the farm's budget depend on the calendar.
      void queryClient.invalidateQueries({
        queryKey: seasonKeys.all,
        predicate: (query) => query.queryKey[2] !== 'calendar',
      });
    },
  });
}

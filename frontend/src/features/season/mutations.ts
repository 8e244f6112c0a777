import { useMutation, useQueryClient } from '@tanstack/react-query';
import { client, ifMatch, unwrap } from '../../api/client';
import type { ProductionCalendarInput } from '../../api/types';
import type { VersionedSave } from '../../components/save-conflict';
import { seasonKeys } from '../../api/query-keys';

export function usePutProductionCalendar(houseId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, version }: VersionedSave<ProductionCalendarInput>) =>
      unwrap(
        client.PUT('/api/houses/{houseId}/calendar', { params: { path: { houseId }, header: ifMatch(version) }, body }),
      ),
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

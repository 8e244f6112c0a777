import { useMutation, useQueryClient } from '@tanstack/react-query';
import { client, ifMatch, unwrap } from '../../api/client';
import type { Measure, ProductionCalendarInput } from '../../api/types';
import type { VersionedSave } from '../../components/save-conflict';
import { measurePlanKeys, seasonKeys } from '../../api/query-keys';

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

/** Keeps the measures and their costs with the house, so they are there next time. */
export function usePutMeasurePlan(houseId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, version }: VersionedSave<{ measures: Measure[] }>) =>
      unwrap(
        client.PUT('/api/houses/{houseId}/measure-plan', {
          params: { path: { houseId }, header: ifMatch(version) },
          body,
        }),
      ),
    onSuccess: (saved) => queryClient.setQueryData(measurePlanKeys.house(houseId), saved),
  });
}

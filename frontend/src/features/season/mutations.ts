import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { Measure, MeasurePlan, ProductionCalendar, ProductionCalendarInput } from '../../api/types';
import type { VersionedSave } from '../../components/save-conflict';
import { measurePlanKeys, seasonKeys } from '../../api/query-keys';

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

/** Keeps the measures and their costs with the house, so they are there next time. */
export function usePutMeasurePlan(houseId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ body, version }: VersionedSave<{ measures: Measure[] }>) =>
      api.put<MeasurePlan>(`/api/houses/${houseId}/measure-plan`, body, { ifMatch: version }),
    onSuccess: (saved) => queryClient.setQueryData(measurePlanKeys.house(houseId), saved),
  });
}

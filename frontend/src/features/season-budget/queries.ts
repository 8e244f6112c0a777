import { queryOptions } from '@tanstack/react-query';
import { client, downloadFile, unwrap } from '../../api/client';
import type { HeatLossBasis, SeasonBudgetRequest, UnitSystem } from '../../api/types';
import { seasonBudgetKeys } from '../../api/query-keys';

/** Under 'season' so that a change of prices, climate or calendar refreshes every season result. */

/** The budget is computed (and stored nowhere), so it is a POST read like a query. */
export const seasonBudgetQueryOptions = (farmId: number, request: SeasonBudgetRequest = {}) =>
  queryOptions({
    queryKey: seasonBudgetKeys.farm(farmId, request),
    queryFn: ({ signal }) =>
      unwrap(client.POST('/api/farms/{farmId}/season-budget', { params: { path: { farmId } }, body: request, signal })),
    staleTime: 0, // the house, climate, prices or calendar may change elsewhere; a rerun is quick
  });

/**
 * The budget as CSV in the reader's units, through the client (token, errors as ApiError); on the
 * calibrated heat loss when the page shows that basis.
 */
export const downloadSeasonBudgetCsv = (farmId: number, units: UnitSystem, heatLossBasis?: HeatLossBasis) =>
  downloadFile(
    client.GET('/api/farms/{farmId}/season-budget.csv', {
      params: {
        path: { farmId },
        query: heatLossBasis === 'calibrated' ? { units, heatLossBasis } : { units },
      },
      parseAs: 'blob',
    }),
    `season-budget-farm-${farmId}-${units}.csv`,
  );

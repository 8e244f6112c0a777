import { queryOptions } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { SeasonBudget, SeasonBudgetRequest } from '../../api/types';
import { seasonBudgetKeys } from '../../api/query-keys';

/** Under 'season' so that a change of prices, climate or calendar refreshes every season result. */

/** The budget is computed (and stored nowhere), so it is a POST read like a query. */
export const seasonBudgetQueryOptions = (farmId: number, request: SeasonBudgetRequest = {}) =>
  queryOptions({
    queryKey: seasonBudgetKeys.farm(farmId, request),
    queryFn: ({ signal }) => api.post<SeasonBudget>(`/api/farms/${farmId}/season-budget`, request, { signal }),
    staleTime: 0, // the house, climate, prices or calendar may change elsewhere; a rerun is quick
  });

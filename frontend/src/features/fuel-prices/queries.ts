import { queryOptions } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { FarmFuelPrices } from '../../api/types';
import { fuelPriceKeys } from '../../api/query-keys';

export const farmFuelPricesQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: fuelPriceKeys.farm(farmId),
    queryFn: ({ signal }) => api.get<FarmFuelPrices>(`/api/farms/${farmId}/fuel-prices`, { signal }),
  });

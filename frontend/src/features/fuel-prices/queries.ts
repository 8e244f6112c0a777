import { queryOptions } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { FarmFuelPrices } from '../../api/types';

export const fuelPriceKeys = {
  all: ['fuel-prices'] as const,
  farm: (farmId: number) => [...fuelPriceKeys.all, 'farm', farmId] as const,
};

export const farmFuelPricesQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: fuelPriceKeys.farm(farmId),
    queryFn: ({ signal }) => api.get<FarmFuelPrices>(`/api/farms/${farmId}/fuel-prices`, { signal }),
  });

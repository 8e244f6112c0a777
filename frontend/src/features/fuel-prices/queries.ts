import { queryOptions } from '@tanstack/react-query';
import { client, unwrap } from '../../api/client';
import { fuelPriceKeys } from '../../api/query-keys';

export const farmFuelPricesQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: fuelPriceKeys.farm(farmId),
    queryFn: ({ signal }) =>
      unwrap(client.GET('/api/farms/{farmId}/fuel-prices', { params: { path: { farmId } }, signal })),
  });

import { queryOptions } from '@tanstack/react-query';
import { client, unwrap } from '../../api/client';
import { weatherKeys } from '../../api/query-keys';

export const weatherSourceQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: weatherKeys.source(farmId),
    queryFn: ({ signal }) =>
      unwrap(client.GET('/api/farms/{farmId}/weather', { params: { path: { farmId } }, signal })),
    staleTime: Infinity,
  });

/** One year of hourly history, fetched by the server (or already in its cache). */
export const fetchWeatherYear = (farmId: number, year: number) =>
  unwrap(client.POST('/api/farms/{farmId}/weather/years/{year}', { params: { path: { farmId, year } } }));

export const fetchClimateProposal = (farmId: number, fromYear: number, toYear: number) =>
  unwrap(
    client.GET('/api/farms/{farmId}/weather/climate-proposal', {
      params: { path: { farmId }, query: { fromYear, toYear } },
    }),
  );

/** Design values and monthly normals from a year or more of one of the farm's hourly logs. */
export const fetchLogClimateProposal = (farmId: number, logId: number) =>
  unwrap(
    client.GET('/api/farms/{farmId}/temperature-logs/{logId}/climate-proposal', {
      params: { path: { farmId, logId } },
    }),
  );

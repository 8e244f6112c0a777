import { queryOptions } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { ClimateProposal, LogClimateProposal, WeatherSource, WeatherYearStatus } from '../../api/types';
import { weatherKeys } from '../../api/query-keys';

export const weatherSourceQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: weatherKeys.source(farmId),
    queryFn: ({ signal }) => api.get<WeatherSource>(`/api/farms/${farmId}/weather`, { signal }),
    staleTime: Infinity,
  });

/** One year of hourly history, fetched by the server (or already in its cache). */
export const fetchWeatherYear = (farmId: number, year: number) =>
  api.post<WeatherYearStatus>(`/api/farms/${farmId}/weather/years/${year}`);

export const fetchClimateProposal = (farmId: number, fromYear: number, toYear: number) =>
  api.get<ClimateProposal>(`/api/farms/${farmId}/weather/climate-proposal?fromYear=${fromYear}&toYear=${toYear}`);

/** Design values and monthly normals from a year or more of one of the farm's hourly logs. */
export const fetchLogClimateProposal = (farmId: number, logId: number) =>
  api.get<LogClimateProposal>(`/api/farms/${farmId}/temperature-logs/${logId}/climate-proposal`);

import { queryOptions } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { ClientFarm, Report, ReportSummary, UnitSystem } from '../../api/types';
import { reportKeys } from '../../api/query-keys';

export const houseReportsQueryOptions = (houseId: number) =>
  queryOptions({
    queryKey: reportKeys.house(houseId),
    queryFn: ({ signal }) => api.get<ReportSummary[]>(`/api/houses/${houseId}/reports`, { signal }),
  });

export const farmReportsQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: reportKeys.farm(farmId),
    queryFn: ({ signal }) => api.get<ReportSummary[]>(`/api/farms/${farmId}/reports`, { signal }),
  });

export const reportQueryOptions = (reportId: number, unitSystem: UnitSystem | undefined) =>
  queryOptions({
    queryKey: reportKeys.detail(reportId, unitSystem),
    queryFn: ({ signal }) => api.get<Report>(`/api/reports/${reportId}`, { signal }),
  });

export const clientFarmsQueryOptions = () =>
  queryOptions({
    queryKey: reportKeys.advising(),
    queryFn: ({ signal }) => api.get<ClientFarm[]>('/api/advising', { signal }),
  });

export const reportPdfPath = (reportId: number) => `/api/reports/${reportId}.pdf`;

import { queryOptions } from '@tanstack/react-query';
import { client, downloadFile, unwrap } from '../../api/client';
import type { UnitSystem } from '../../api/types';
import { reportKeys } from '../../api/query-keys';

export const houseReportsQueryOptions = (houseId: number) =>
  queryOptions({
    queryKey: reportKeys.house(houseId),
    queryFn: ({ signal }) =>
      unwrap(client.GET('/api/houses/{houseId}/reports', { params: { path: { houseId } }, signal })),
  });

export const farmReportsQueryOptions = (farmId: number) =>
  queryOptions({
    queryKey: reportKeys.farm(farmId),
    queryFn: ({ signal }) =>
      unwrap(client.GET('/api/farms/{farmId}/reports', { params: { path: { farmId } }, signal })),
  });

export const reportQueryOptions = (reportId: number, unitSystem: UnitSystem | undefined) =>
  queryOptions({
    queryKey: reportKeys.detail(reportId, unitSystem),
    queryFn: ({ signal }) => unwrap(client.GET('/api/reports/{reportId}', { params: { path: { reportId } }, signal })),
  });

export const clientFarmsQueryOptions = () =>
  queryOptions({
    queryKey: reportKeys.advising(),
    queryFn: ({ signal }) => unwrap(client.GET('/api/advising', { signal })),
  });

/** The report's PDF as a file, through the client (token, errors as ApiError). */
export const downloadReportPdf = (reportId: number) =>
  downloadFile(
    client.GET('/api/reports/{reportId}.pdf', { params: { path: { reportId } }, parseAs: 'blob' }),
    `report-${reportId}.pdf`,
  );

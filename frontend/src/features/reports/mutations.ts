import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../api/client';
import type { CreateReportRequest, Report, ReportSent, SendReportRequest, UpdateReportRequest } from '../../api/types';
import { reportKeys } from '../../api/query-keys';

function useRefreshReports() {
  const queryClient = useQueryClient();
  return () => void queryClient.invalidateQueries({ queryKey: reportKeys.all });
}

export function useCreateReport(houseId: number) {
  const refresh = useRefreshReports();
  return useMutation({
    mutationFn: (body: CreateReportRequest) => api.post<Report>(`/api/houses/${houseId}/reports`, body),
    onSuccess: refresh,
  });
}

export function useUpdateReport(reportId: number) {
  const refresh = useRefreshReports();
  return useMutation({
    mutationFn: (body: UpdateReportRequest) => api.patch<Report>(`/api/reports/${reportId}`, body),
    onSuccess: refresh,
  });
}

export function useIssueReport(reportId: number) {
  const refresh = useRefreshReports();
  return useMutation({
    mutationFn: () => api.post<Report>(`/api/reports/${reportId}/issue`),
    onSuccess: refresh,
  });
}

export function useReviseReport(reportId: number) {
  const refresh = useRefreshReports();
  return useMutation({
    mutationFn: () => api.post<Report>(`/api/reports/${reportId}/revisions`),
    onSuccess: refresh,
  });
}

export function useSendReport(reportId: number) {
  return useMutation({
    mutationFn: (body: SendReportRequest) => api.post<ReportSent>(`/api/reports/${reportId}/send`, body),
  });
}

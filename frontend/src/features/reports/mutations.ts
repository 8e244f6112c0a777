import { useMutation, useQueryClient } from '@tanstack/react-query';
import { client, unwrap } from '../../api/client';
import type { CreateReportRequest, SendReportRequest, UpdateReportRequest } from '../../api/types';
import { reportKeys } from '../../api/query-keys';

function useRefreshReports() {
  const queryClient = useQueryClient();
  return () => void queryClient.invalidateQueries({ queryKey: reportKeys.all });
}

export function useCreateReport(houseId: number) {
  const refresh = useRefreshReports();
  return useMutation({
    mutationFn: (body: CreateReportRequest) =>
      unwrap(client.POST('/api/houses/{houseId}/reports', { params: { path: { houseId } }, body })),
    onSuccess: refresh,
  });
}

export function useUpdateReport(reportId: number) {
  const refresh = useRefreshReports();
  return useMutation({
    mutationFn: (body: UpdateReportRequest) =>
      unwrap(client.PATCH('/api/reports/{reportId}', { params: { path: { reportId } }, body })),
    onSuccess: refresh,
  });
}

export function useIssueReport(reportId: number) {
  const refresh = useRefreshReports();
  return useMutation({
    mutationFn: () => unwrap(client.POST('/api/reports/{reportId}/issue', { params: { path: { reportId } } })),
    onSuccess: refresh,
  });
}

export function useReviseReport(reportId: number) {
  const refresh = useRefreshReports();
  return useMutation({
    mutationFn: () => unwrap(client.POST('/api/reports/{reportId}/revisions', { params: { path: { reportId } } })),
    onSuccess: refresh,
  });
}

export function useSendReport(reportId: number) {
  return useMutation({
    mutationFn: (body: SendReportRequest) =>
      unwrap(client.POST('/api/reports/{reportId}/send', { params: { path: { reportId } }, body })),
  });
}

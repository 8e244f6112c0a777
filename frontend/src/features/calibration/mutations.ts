import { useMutation, useQueryClient } from '@tanstack/react-query';
import { client, ifMatch, multipartBody, unwrap } from '../../api/client';
import type { FuelRecordColumnMapping, FuelRecordInput, FuelRecordUpdate } from '../../api/types';
import { calibrationKeys, seasonKeys } from '../../api/query-keys';

function fileForm(file: File, fields: Record<string, string> = {}): FormData {
  const form = new FormData();
  for (const [name, value] of Object.entries(fields)) form.append(name, value);
  form.append('file', file, file.name);
  return form;
}

export function useCreateFuelRecord(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: FuelRecordInput) =>
      unwrap(client.POST('/api/farms/{farmId}/fuel-records', { params: { path: { farmId } }, body })),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: calibrationKeys.records(farmId) }),
  });
}

export function useUpdateFuelRecord(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, body, version }: { id: number; body: FuelRecordUpdate; version: number }) =>
      unwrap(
        client.PATCH('/api/fuel-records/{recordId}', {
          params: { path: { recordId: id }, header: ifMatch(version) },
          body,
        }),
      ),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: calibrationKeys.records(farmId) }),
  });
}

export function useDeleteFuelRecord(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) =>
      unwrap(client.DELETE('/api/fuel-records/{recordId}', { params: { path: { recordId: id } } })),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: calibrationKeys.records(farmId) }),
  });
}

export function useInspectFuelCsv(farmId: number) {
  return useMutation({
    mutationFn: (file: File) =>
      unwrap(
        client.POST('/api/farms/{farmId}/fuel-records/inspect', {
          params: { path: { farmId } },
          body: multipartBody(fileForm(file)),
        }),
      ),
  });
}

export function useUploadFuelCsv(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, mapping }: { file: File; mapping: FuelRecordColumnMapping }) =>
      unwrap(
        client.POST('/api/farms/{farmId}/fuel-records/upload', {
          params: { path: { farmId } },
          body: multipartBody(fileForm(file, { mapping: JSON.stringify(mapping) })),
        }),
      ),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: calibrationKeys.records(farmId) }),
  });
}

/** Runs and saves a calibration; every season result may change with it. */
export function useRunCalibration(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => unwrap(client.POST('/api/farms/{farmId}/calibrations', { params: { path: { farmId } } })),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: calibrationKeys.calibrations(farmId) });
      void queryClient.invalidateQueries({ queryKey: seasonKeys.all });
    },
  });
}

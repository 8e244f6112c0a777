import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, postForm } from '../../api/client';
import type {
  Calibration,
  FuelRecord,
  FuelRecordColumnMapping,
  FuelRecordCsvInspection,
  FuelRecordInput,
  FuelRecordsUploadResult,
  FuelRecordUpdate,
} from '../../api/types';
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
    mutationFn: (body: FuelRecordInput) => api.post<FuelRecord>(`/api/farms/${farmId}/fuel-records`, body),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: calibrationKeys.records(farmId) }),
  });
}

export function useUpdateFuelRecord(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, body, version }: { id: number; body: FuelRecordUpdate; version: number }) =>
      api.patch<FuelRecord>(`/api/fuel-records/${id}`, body, { ifMatch: version }),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: calibrationKeys.records(farmId) }),
  });
}

export function useDeleteFuelRecord(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete(`/api/fuel-records/${id}`),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: calibrationKeys.records(farmId) }),
  });
}

export function useInspectFuelCsv(farmId: number) {
  return useMutation({
    mutationFn: (file: File) =>
      postForm<FuelRecordCsvInspection>(`/api/farms/${farmId}/fuel-records/inspect`, fileForm(file)),
  });
}

export function useUploadFuelCsv(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, mapping }: { file: File; mapping: FuelRecordColumnMapping }) =>
      postForm<FuelRecordsUploadResult>(
        `/api/farms/${farmId}/fuel-records/upload`,
        fileForm(file, { mapping: JSON.stringify(mapping) }),
      ),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: calibrationKeys.records(farmId) }),
  });
}

/** Runs and saves a calibration; every season result may change with it. */
export function useRunCalibration(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<Calibration>(`/api/farms/${farmId}/calibrations`),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: calibrationKeys.calibrations(farmId) });
      void queryClient.invalidateQueries({ queryKey: seasonKeys.all });
    },
  });
}

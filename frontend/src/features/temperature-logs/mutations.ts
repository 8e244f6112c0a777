import { useMutation, useQueryClient } from '@tanstack/react-query';
import { client, multipartBody, unwrap, uploadWithProgress, type UploadProgress } from '../../api/client';
import type { TemperatureColumnMapping, TemperatureLog } from '../../api/types';
import { temperatureLogKeys } from '../../api/query-keys';

function fileForm(file: File, fields: Record<string, string> = {}): FormData {
  const form = new FormData();
  for (const [name, value] of Object.entries(fields)) form.append(name, value);
  // The file part last, so the text fields are read before it.
  form.append('file', file, file.name);
  return form;
}

/** Reads the start of the file on the server and proposes a column mapping; stores nothing. */
export function useInspectTemperatureCsv(farmId: number) {
  return useMutation({
    mutationFn: (file: File) =>
      unwrap(
        client.POST('/api/farms/{farmId}/temperature-logs/inspect', {
          params: { path: { farmId } },
          body: multipartBody(fileForm(file)),
        }),
      ),
  });
}

export interface UploadTemperatureLogVariables {
  file: File;
  name: string;
  mapping: TemperatureColumnMapping;
  onProgress?: (progress: UploadProgress) => void;
  signal?: AbortSignal;
}

export function useUploadTemperatureLog(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, name, mapping, onProgress, signal }: UploadTemperatureLogVariables) =>
      uploadWithProgress<TemperatureLog>(
        `/api/farms/${farmId}/temperature-logs`,
        fileForm(file, { name, mapping: JSON.stringify(mapping) }),
        { onProgress, signal },
      ),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: temperatureLogKeys.farm(farmId) }),
  });
}

export function useDeleteTemperatureLog(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (logId: number) =>
      unwrap(client.DELETE('/api/temperature-logs/{logId}', { params: { path: { logId } } })),
    onSuccess: (_result, logId) => {
      queryClient.removeQueries({ queryKey: temperatureLogKeys.detail(logId) });
      void queryClient.invalidateQueries({ queryKey: temperatureLogKeys.farm(farmId) });
    },
  });
}

/** Keeps one year of the farm's weather history as a temperature log (fetched by the server). */
export function useKeepWeatherYearAsLog(farmId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (year: number) =>
      unwrap(
        client.POST('/api/farms/{farmId}/weather/years/{year}/temperature-log', { params: { path: { farmId, year } } }),
      ),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: temperatureLogKeys.farm(farmId) }),
  });
}

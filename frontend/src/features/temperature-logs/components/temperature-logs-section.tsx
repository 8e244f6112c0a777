import { Paper, Stack, Typography } from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { TemperatureLog } from '../../../api/types';
import { ConfirmDialog } from '../../../components/confirm-dialog';
import { ErrorAlert, LoadingState } from '../../../components/feedback';
import { useDeleteTemperatureLog } from '../mutations';
import { farmTemperatureLogsQueryOptions } from '../queries';
import { TemperatureLogChart } from './temperature-log-chart';
import { TemperatureLogUpload } from './temperature-log-upload';
import { WeatherYearLog } from './weather-year-log';
import { TemperatureLogsTable } from './temperature-logs-table';

/** The farm's logged outdoor temperatures: upload, list, preview, delete. */
export function TemperatureLogsSection({ farmId, canEdit }: { farmId: number; canEdit: boolean }) {
  const logs = useQuery(farmTemperatureLogsQueryOptions(farmId));
  const deleteLog = useDeleteTemperatureLog(farmId);
  const [previewLogId, setPreviewLogId] = useState<number | null>(null);
  const [logToDelete, setLogToDelete] = useState<TemperatureLog | null>(null);
  const shownLogId = previewLogId ?? logs.data?.[0]?.id ?? null;

  return (
    <Paper component="section" aria-labelledby="temperature-logs-heading" sx={{ p: 2 }}>
      <Stack spacing={2}>
        <Typography id="temperature-logs-heading" variant="h2">
          Temperature logs
        </Typography>
        <Typography variant="body2" color="text.secondary">
          A year of logged outdoor temperatures can replace the monthly normals in season estimates, and shows the cold
          snaps and mild spells that averages hide.
        </Typography>
        {canEdit ? <TemperatureLogUpload farmId={farmId} onStored={(log) => setPreviewLogId(log.id)} /> : null}
        {canEdit ? <WeatherYearLog farmId={farmId} onStored={(log) => setPreviewLogId(log.id)} /> : null}
        <Typography variant="h3">Stored logs</Typography>
        {logs.isPending ? <LoadingState label="Loading logs…" /> : null}
        <ErrorAlert error={logs.error} title="Logs could not be loaded" />
        <ErrorAlert error={deleteLog.error} title="The log was not deleted" />
        {logs.data ? (
          <TemperatureLogsTable
            logs={logs.data}
            selectedLogId={shownLogId}
            onPreview={setPreviewLogId}
            onDelete={canEdit ? setLogToDelete : undefined}
          />
        ) : null}
        {shownLogId !== null ? <TemperatureLogChart logId={shownLogId} /> : null}
      </Stack>
      <ConfirmDialog
        open={logToDelete !== null}
        title={`Delete ${logToDelete?.name ?? 'this log'}?`}
        message="Season estimates that used this log will fall back to the climate normals."
        confirmLabel="Delete log"
        busy={deleteLog.isPending}
        onClose={() => setLogToDelete(null)}
        onConfirm={() => {
          if (!logToDelete) return;
          const id = logToDelete.id;
          deleteLog.mutate(id, {
            onSuccess: () => setPreviewLogId((current) => (current === id ? null : current)),
            onSettled: () => setLogToDelete(null),
          });
        }}
      />
    </Paper>
  );
}

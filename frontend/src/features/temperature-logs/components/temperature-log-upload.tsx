import { UploadFileIcon } from '../../../components/icons';
import { Alert, AlertTitle, Box, Button, LinearProgress, Stack, Typography } from '@mui/material';
import { TEMPERATURE_LOG_LIMITS } from '@thermbay/engine/vocabulary';
import { useRef, useState, type ChangeEvent } from 'react';
import type { UploadProgress } from '../../../api/client';
import type { TemperatureLog } from '../../../api/types';
import { errorMessage } from '../../../components/feedback';
import { fileProblems } from '../column-mapping';
import { useInspectTemperatureCsv, useUploadTemperatureLog } from '../mutations';
import { ColumnMappingForm } from './column-mapping-form';

/** A refused file: the message and each problem with its line number. Nothing was stored. */
function FileProblems({ error, title }: { error: unknown; title: string }) {
  if (!error) return null;
  const problems = fileProblems(error);
  return (
    <Alert severity="error" role="alert">
      <AlertTitle>{title}</AlertTitle>
      {errorMessage(error)}
      {problems.length > 0 ? (
        <Box component="ul" aria-label="Problems in the file" sx={{ m: 0, mt: 1, pl: 2 }}>
          {problems.map((problem, index) => (
            <li key={`${problem.where}-${index}`}>
              <strong>{problem.where}:</strong> {problem.message}
            </li>
          ))}
        </Box>
      ) : null}
    </Alert>
  );
}

function progressText(progress: UploadProgress): string {
  if (progress.fraction === null) return `Uploading… ${(progress.loadedBytes / 1024).toFixed(0)} KB sent`;
  if (progress.fraction >= 1) return 'Uploaded; the server is reading the file…';
  return `Uploading… ${Math.round(progress.fraction * 100)} %`;
}

/** Choose a CSV → the server proposes columns → the user confirms → upload with progress. */
export function TemperatureLogUpload({
  farmId,
  onStored,
}: {
  farmId: number;
  onStored?: (log: TemperatureLog) => void;
}) {
  const inspect = useInspectTemperatureCsv(farmId);
  const upload = useUploadTemperatureLog(farmId);
  const [file, setFile] = useState<File | null>(null);
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const [stored, setStored] = useState<TemperatureLog | null>(null);
  const inputRef = useRef<HTMLInputElement>(null);

  const startOver = () => {
    setFile(null);
    setProgress(null);
    inspect.reset();
    upload.reset();
    if (inputRef.current) inputRef.current.value = '';
  };

  const onFileChosen = (event: ChangeEvent<HTMLInputElement>) => {
    const chosen = event.target.files?.[0];
    if (!chosen) return;
    setStored(null);
    setProgress(null);
    upload.reset();
    setFile(chosen);
    inspect.mutate(chosen);
  };

  return (
    <Stack spacing={2}>
      <Stack direction="row" spacing={2} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
        <Button component="label" variant="outlined" startIcon={<UploadFileIcon />} disabled={upload.isPending}>
          Choose a CSV file
          <input
            ref={inputRef}
            type="file"
            accept=".csv,.txt,text/csv,text/plain"
            hidden
            aria-label="CSV file of temperatures"
            aria-describedby="temperature-file-limits"
            onChange={onFileChosen}
          />
        </Button>
        <Typography variant="body2" color="text.secondary" id="temperature-file-limits">
          Hourly or daily outdoor temperatures, one reading per row, with a date (and time) column. A UTF-8 CSV file of
          at most {TEMPERATURE_LOG_LIMITS.maxBytes / 1024 / 1024} MB and{' '}
          {TEMPERATURE_LOG_LIMITS.maxRows.toLocaleString('en-US')} rows.
        </Typography>
      </Stack>
      {stored ? (
        <Alert severity="success" role="status">
          Stored “{stored.name}”: {stored.readingCount.toLocaleString('en-US')} readings from {stored.startDate} to{' '}
          {stored.endDate}.
        </Alert>
      ) : null}
      {inspect.isPending ? <LinearProgress aria-label="Reading the file" /> : null}
      <FileProblems error={inspect.error} title="The file could not be read" />
      {file && inspect.data ? (
        <ColumnMappingForm
          key={`${file.name}-${file.size}-${file.lastModified}`}
          inspection={inspect.data}
          fileName={file.name}
          busy={upload.isPending}
          onCancel={startOver}
          onConfirm={(name, mapping) => {
            setProgress({ loadedBytes: 0, totalBytes: file.size, fraction: 0 });
            upload.mutate(
              { file, name, mapping, onProgress: setProgress },
              {
                onSuccess: (log) => {
                  setStored(log);
                  onStored?.(log);
                  startOver();
                },
              },
            );
          }}
        >
          {upload.isPending && progress ? (
            <Box>
              <LinearProgress
                variant={progress.fraction === null ? 'indeterminate' : 'determinate'}
                value={progress.fraction === null ? undefined : progress.fraction * 100}
                aria-label="Upload progress"
              />
              <Typography variant="caption" color="text.secondary" role="status">
                {progressText(progress)}
              </Typography>
            </Box>
          ) : null}
          <FileProblems error={upload.error} title="Nothing was stored" />
        </ColumnMappingForm>
      ) : null}
    </Stack>
  );
}

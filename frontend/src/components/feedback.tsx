import { Alert, Box, CircularProgress, Typography } from '@mui/material';
import { ApiError } from '../api/client';

export function LoadingState({ label = 'Loading…' }: { label?: string }) {
  return (
    <Box role="status" aria-live="polite" sx={{ display: 'flex', alignItems: 'center', gap: 2, py: 4 }}>
      <CircularProgress size={24} aria-hidden />
      <Typography>{label}</Typography>
    </Box>
  );
}

export function errorMessage(error: unknown): string {
  if (error instanceof ApiError) return error.message;
  if (error instanceof Error) return error.message;
  return 'Something went wrong.';
}

export function ErrorAlert({ error, title }: { error: unknown; title?: string }) {
  if (!error) return null;
  const details = error instanceof ApiError ? error.details : [];
  return (
    <Alert severity="error" role="alert">
      {title ? <strong>{title}: </strong> : null}
      {errorMessage(error)}
      {details.length > 0 ? (
        <Box component="ul" sx={{ m: 0, pl: 2 }}>
          {details.map((detail) => (
            <li key={`${detail.field}:${detail.message}`}>{detail.message}</li>
          ))}
        </Box>
      ) : null}
    </Alert>
  );
}

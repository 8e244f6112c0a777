import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  LinearProgress,
  MenuItem,
  Stack,
  TextField,
  Typography,
} from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { useRef, useState } from 'react';
import type { ClimateProposal, SiteClimate } from '../../../api/types';
import { ErrorAlert } from '../../../components/feedback';
import { fetchClimateProposal, fetchWeatherYear, weatherSourceQueryOptions } from '../weather-queries';
import { climateFromProposal, DEFAULT_CHOICE, type ProposalChoice } from '../weather-proposal';
import { ClimateProposalReview } from './climate-proposal-review';

export interface WeatherFillDialogProps {
  farmId: number;
  open: boolean;
  current: SiteClimate | null;
  onClose: () => void;
  /** saves the confirmed climate (SI) */
  onSave: (climate: SiteClimate) => Promise<unknown>;
}

type Progress = { done: number; total: number; year: number | null };

/**
 * Fills the farm's climate from years of hourly weather history: fetch year by year (with
 * progress), show the proposal beside the current values, save only what the user keeps.
 */
export function WeatherFillDialog({ farmId, open, current, onClose, onSave }: WeatherFillDialogProps) {
  const source = useQuery({ ...weatherSourceQueryOptions(farmId), enabled: open });
  const [fromYear, setFromYear] = useState<number | null>(null);
  const [toYear, setToYear] = useState<number | null>(null);
  const [progress, setProgress] = useState<Progress | null>(null);
  const [proposal, setProposal] = useState<ClimateProposal | null>(null);
  const [choice, setChoice] = useState<ProposalChoice>(DEFAULT_CHOICE);
  const [error, setError] = useState<unknown>(null);
  const [saving, setSaving] = useState(false);
  const cancelled = useRef(false);

  const from = fromYear ?? source.data?.defaultFromYear ?? null;
  const to = toYear ?? source.data?.defaultToYear ?? null;
  const last = source.data?.lastCompleteYear ?? new Date().getFullYear() - 1;
  const years = Array.from({ length: last - 1940 + 1 }, (_, i) => last - i);
  const spanInvalid = from === null || to === null || from > to || to - from + 1 > 30;
  const busy = progress !== null && proposal === null && error === null;
  const toSave = proposal ? climateFromProposal(proposal, current, choice) : null;

  const close = () => {
    cancelled.current = true;
    setProgress(null);
    setProposal(null);
    setError(null);
    onClose();
  };

  const fetchHistory = async () => {
    if (from === null || to === null) return;
    cancelled.current = false;
    setError(null);
    setProposal(null);
    const total = to - from + 1;
    try {
      for (let year = from; year <= to; year++) {
        if (cancelled.current) return;
        setProgress({ done: year - from, total, year });
        await fetchWeatherYear(farmId, year);
      }
      setProgress({ done: total, total, year: null });
      const result = await fetchClimateProposal(farmId, from, to);
      if (!cancelled.current) setProposal(result);
    } catch (caught) {
      setError(caught);
    }
  };

  const save = async () => {
    if (!toSave) return;
    setSaving(true);
    setError(null);
    try {
      await onSave(toSave);
      close();
    } catch (caught) {
      setError(caught);
    } finally {
      setSaving(false);
    }
  };

  return (
    <Dialog open={open} onClose={busy ? undefined : close} maxWidth="md" fullWidth aria-labelledby="weather-fill-title">
      <DialogTitle id="weather-fill-title">Fill the climate from weather history</DialogTitle>
      <DialogContent>
        <Stack spacing={2} sx={{ pt: 1 }}>
          <ErrorAlert error={source.error} title="Weather history is not available" />
          {source.data ? (
            <Alert severity={source.data.standIn ? 'warning' : 'info'} data-testid="weather-source-note">
              {source.data.note}
            </Alert>
          ) : null}
          <Typography variant="body2">
            Thermbay reads the hourly air temperature, dew point and sunshine at the farm&apos;s coordinates for whole
            years, and works out the heating design temperature (the value 99.6 % or 99 % of the hours stay at or
            above), the cooling design temperature (0.4 % or 1 % of the hours at or above) with its coincident wet bulb,
            the daily range, and each month&apos;s mean daily minimum, maximum and clearness. Nothing is saved until you
            confirm.
          </Typography>
          <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ alignItems: { sm: 'center' } }}>
            <TextField
              select
              label="From year"
              value={from ?? ''}
              onChange={(event) => setFromYear(Number(event.target.value))}
              disabled={busy || !source.data}
              sx={{ minWidth: 140 }}
            >
              {years.map((year) => (
                <MenuItem key={year} value={year}>
                  {year}
                </MenuItem>
              ))}
            </TextField>
            <TextField
              select
              label="To year"
              value={to ?? ''}
              onChange={(event) => setToYear(Number(event.target.value))}
              disabled={busy || !source.data}
              sx={{ minWidth: 140 }}
            >
              {years.map((year) => (
                <MenuItem key={year} value={year}>
                  {year}
                </MenuItem>
              ))}
            </TextField>
            <Button
              variant="outlined"
              onClick={() => void fetchHistory()}
              sx={{ whiteSpace: 'nowrap', flexShrink: 0 }}
              disabled={busy || spanInvalid || !source.data}
            >
              Read the history
            </Button>
          </Stack>
          {spanInvalid && source.data ? (
            <Typography variant="body2" color="error">
              Choose a span of 1 to 30 whole years, the first not after the last.
            </Typography>
          ) : null}
          {progress && !proposal ? (
            <Stack spacing={0.5} role="status" aria-live="polite">
              <LinearProgress
                variant="determinate"
                value={(100 * progress.done) / progress.total}
                aria-label="Weather history read so far"
              />
              <Typography variant="body2">
                {progress.year === null
                  ? 'Working out the climate…'
                  : `Reading ${progress.year} (${progress.done + 1} of ${progress.total} years)…`}
              </Typography>
            </Stack>
          ) : null}
          <ErrorAlert error={error} title="Nothing was changed" />
          {proposal ? (
            <Stack spacing={2} data-testid="weather-proposal">
              <Typography variant="body2">
                Years used: {proposal.yearsUsed.map((y) => y.year).join(', ')} (
                {proposal.hoursUsed.toLocaleString('en-US')} hours, grid point {proposal.gridLatitudeDeg}°,{' '}
                {proposal.gridLongitudeDeg}°).
                {proposal.yearsLeftOut.length
                  ? ` Left out: ${proposal.yearsLeftOut.map((y) => `${y.year} (${y.reason})`).join('; ')}.`
                  : ''}
              </Typography>
              <ClimateProposalReview
                proposal={proposal}
                current={current}
                choice={choice}
                onChoice={setChoice}
                proposedHeading="From the history"
              />
            </Stack>
          ) : null}
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={close}>{proposal ? 'Discard' : 'Cancel'}</Button>
        <Button variant="contained" onClick={() => void save()} disabled={!toSave || saving}>
          Save these values
        </Button>
      </DialogActions>
    </Dialog>
  );
}

import {
  Box,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  MenuItem,
  Stack,
  TextField,
  Typography,
} from '@mui/material';
import { useState } from 'react';
import type { LogClimateProposal, SiteClimate } from '../../../api/types';
import { ErrorAlert, LoadingState } from '../../../components/feedback';
import { fetchLogClimateProposal } from '../weather-queries';
import { climateFromProposal, DEFAULT_CHOICE, type ProposalChoice } from '../weather-proposal';
import { ClimateProposalReview } from './climate-proposal-review';

/** A stored temperature log the climate may be worked out from. */
export interface ClimateLogChoice {
  id: number;
  name: string;
  startDate: string;
  endDate: string;
  resolution: 'hourly' | 'daily';
}

export interface LogClimateDialogProps {
  farmId: number;
  logs: ClimateLogChoice[];
  open: boolean;
  current: SiteClimate | null;
  onClose: () => void;
  /** saves the confirmed climate (SI) */
  onSave: (climate: SiteClimate) => Promise<unknown>;
}

/**
 * Proposes the farm's design temperatures and monthly normals from a year of its own hourly log,
 * shown beside the current values; only what the user keeps is saved.
 */
export function LogClimateDialog({ farmId, logs, open, current, onClose, onSave }: LogClimateDialogProps) {
  const [logId, setLogId] = useState<number | null>(null);
  const [proposal, setProposal] = useState<LogClimateProposal | null>(null);
  const [choice, setChoice] = useState<ProposalChoice>(DEFAULT_CHOICE);
  const [error, setError] = useState<unknown>(null);
  const [busy, setBusy] = useState(false);
  const chosen = logId ?? logs.find((log) => log.resolution === 'hourly')?.id ?? logs[0]?.id ?? null;
  const toSave = proposal ? climateFromProposal(proposal, current, choice) : null;

  const close = () => {
    setProposal(null);
    setError(null);
    setChoice(DEFAULT_CHOICE);
    onClose();
  };

  const propose = async () => {
    if (chosen === null) return;
    setBusy(true);
    setError(null);
    setProposal(null);
    try {
      setProposal(await fetchLogClimateProposal(farmId, chosen));
    } catch (caught) {
      setError(caught);
    } finally {
      setBusy(false);
    }
  };

  const save = async () => {
    if (!toSave) return;
    setBusy(true);
    setError(null);
    try {
      await onSave(toSave);
      close();
    } catch (caught) {
      setError(caught);
    } finally {
      setBusy(false);
    }
  };

  return (
    <Dialog open={open} onClose={busy ? undefined : close} maxWidth="md" fullWidth aria-labelledby="log-climate-title">
      <DialogTitle id="log-climate-title">Climate from the farm&apos;s own temperature log</DialogTitle>
      <DialogContent>
        <Stack spacing={2} sx={{ pt: 1 }}>
          <Typography variant="body2">
            From a log of at least a year of hourly readings, Thermbay works out the heating design temperature (the
            value 99.6 % or 99 % of the hours stay at or above), the cooling design temperature (0.4 % or 1 % of the
            hours at or above) and each month&apos;s mean daily minimum and maximum. Nothing is saved until you confirm.
          </Typography>
          {logs.length === 0 ? (
            <Typography variant="body2" color="text.secondary">
              The farm has no temperature logs yet: upload one under Temperature logs.
            </Typography>
          ) : (
            <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2} sx={{ alignItems: { sm: 'center' } }}>
              <TextField
                select
                label="Temperature log"
                value={chosen ?? ''}
                onChange={(event) => {
                  setLogId(Number(event.target.value));
                  setProposal(null);
                  setError(null);
                }}
                sx={{ minWidth: 320 }}
                disabled={busy}
              >
                {logs.map((log) => (
                  <MenuItem key={log.id} value={log.id}>
                    {log.name} ({log.startDate} to {log.endDate}
                    {log.resolution === 'daily' ? ', daily' : ''})
                  </MenuItem>
                ))}
              </TextField>
              <Button variant="outlined" onClick={() => void propose()} disabled={busy || chosen === null}>
                Work out the climate
              </Button>
            </Stack>
          )}
          {busy && !proposal ? <LoadingState label="Reading the log…" /> : null}
          <ErrorAlert error={error} title="No proposal from this log" />
          {proposal ? (
            <Stack spacing={2} data-testid="log-climate-proposal">
              <Typography variant="body2">
                {proposal.temperatureLogName}: {proposal.firstHour.replace('T', ' ')} to{' '}
                {proposal.lastHour.replace('T', ' ')}, {proposal.hoursUsed.toLocaleString('en-US')} hours with a
                reading.
              </Typography>
              <Box component="ul" sx={{ m: 0, pl: 2.5 }}>
                {proposal.notes.map((note) => (
                  <Typography component="li" variant="body2" color="text.secondary" key={note}>
                    {note}
                  </Typography>
                ))}
              </Box>
              <ClimateProposalReview
                proposal={proposal}
                current={current}
                choice={choice}
                onChoice={setChoice}
                proposedHeading="From the log"
              />
            </Stack>
          ) : null}
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={close}>{proposal ? 'Discard' : 'Cancel'}</Button>
        <Button variant="contained" onClick={() => void save()} disabled={!toSave || busy}>
          Save these values
        </Button>
      </DialogActions>
    </Dialog>
  );
}

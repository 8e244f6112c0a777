import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogContentText,
  DialogTitle,
  Stack,
  TextField,
} from '@mui/material';
import { useState } from 'react';
import { ErrorAlert } from '../../../components/feedback';

export interface SaveAlternativeValues {
  name: string;
  costAmount: number | null;
}

/** Names the form's unsaved edits as an alternative of the house, with an optional installed cost. */
export function SaveAlternativeDialog({
  open,
  onClose,
  onSave,
  busy,
  error,
  note,
}: {
  open: boolean;
  onClose: () => void;
  onSave: (values: SaveAlternativeValues) => void;
  busy?: boolean;
  error?: unknown;
  note?: string;
}) {
  const [name, setName] = useState('');
  const [cost, setCost] = useState('');
  const costNumber = cost.trim() === '' ? null : Number(cost);
  const costValid = costNumber === null || (Number.isFinite(costNumber) && costNumber >= 0 && costNumber <= 1e8);
  const nameValid = name.trim().length > 0 && name.length <= 120;
  return (
    <Dialog open={open} onClose={onClose} aria-labelledby="save-alternative-title" fullWidth maxWidth="xs">
      <form
        noValidate
        onSubmit={(event) => {
          event.preventDefault();
          if (nameValid && costValid) onSave({ name: name.trim(), costAmount: costNumber });
        }}
      >
        <DialogTitle id="save-alternative-title">Save as alternative</DialogTitle>
        <DialogContent>
          <Stack spacing={2} sx={{ pt: 1 }}>
            <DialogContentText>
              Your edits are kept as an alternative of this house; the house itself is not changed. Later edits of the
              house carry over to every field the alternative does not change.
            </DialogContentText>
            {note ? <Alert severity="info">{note}</Alert> : null}
            <TextField
              label="Name of the alternative"
              value={name}
              onChange={(event) => setName(event.target.value)}
              required
              autoFocus
              error={name.length > 120}
              helperText={name.length > 120 ? 'At most 120 characters' : 'e.g. Re-cover with inflated double poly'}
            />
            <TextField
              label="Installed cost (optional)"
              value={cost}
              onChange={(event) => setCost(event.target.value)}
              inputMode="decimal"
              error={!costValid}
              helperText={
                costValid ? 'In the currency of the farm’s fuel prices; used for the payback' : 'A number from 0 up'
              }
            />
            <ErrorAlert error={error} title="Not saved" />
          </Stack>
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" disabled={busy || !nameValid || !costValid}>
            {busy ? 'Saving…' : 'Save alternative'}
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}

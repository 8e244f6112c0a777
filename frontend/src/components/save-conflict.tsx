import {
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogContentText,
  DialogTitle,
  type DialogProps,
} from '@mui/material';
import { useQueryClient, type QueryKey, type UseMutationResult } from '@tanstack/react-query';
import { useId, useState, type ReactNode } from 'react';
import { isStaleWrite, type Versioned } from '../api/client';
import { ErrorAlert } from './feedback';

/** What a versioned save sends: the body and the version it was based on (sent as If-Match). */
export interface VersionedSave<TBody> {
  body: TBody;
  version: number;
}

export interface SaveConflictDialogProps {
  open: boolean;
  /** what was being saved, e.g. "house", "fuel prices" */
  what: string;
  onReload: () => void;
  onOverwrite: () => void;
  onClose: () => void;
  busy?: boolean;
  /** a failure of the overwrite itself */
  error?: unknown;
}

/** Someone else saved first: take their version, or save mine over it. */
export function SaveConflictDialog({
  open,
  what,
  onReload,
  onOverwrite,
  onClose,
  busy,
  error,
}: SaveConflictDialogProps) {
  const titleId = useId();
  const textId = useId();
  const onDialogClose: DialogProps['onClose'] = () => {
    if (!busy) onClose();
  };
  return (
    <Dialog open={open} onClose={onDialogClose} aria-labelledby={titleId} aria-describedby={textId}>
      <DialogTitle id={titleId}>Changed by someone else</DialogTitle>
      <DialogContent>
        <DialogContentText id={textId}>
          Someone else saved the {what} after you opened it, so your changes were not saved. Reload their version to see
          what they saved (your unsaved changes are dropped), or overwrite it with yours (their changes are replaced).
        </DialogContentText>
        <ErrorAlert error={error} title="Not saved" />
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose} disabled={busy}>
          Keep editing
        </Button>
        <Button onClick={onReload} disabled={busy}>
          Reload their version
        </Button>
        <Button variant="contained" color="warning" onClick={onOverwrite} disabled={busy}>
          Overwrite with mine
        </Button>
      </DialogActions>
    </Dialog>
  );
}

/**
 * Watches a versioned save: when it fails because someone else saved first (409), shows the
 * conflict dialog. "Reload their version" puts what is stored now into the query cache (the
 * editor, keyed on the stored data, starts afresh from it); "Overwrite with mine" sends the same
 * body again based on the version just learned. Returns the dialog to render beside the editor.
 */
export function useSaveConflict<TBody, TStored extends Versioned>({
  what,
  mutation,
  queryKey,
  onOverwritten,
}: {
  what: string;
  mutation: UseMutationResult<TStored, unknown, VersionedSave<TBody>>;
  /** where the editor reads the stored data */
  queryKey: QueryKey;
  onOverwritten?: (saved: TStored) => void;
}): ReactNode {
  const queryClient = useQueryClient();
  // While "Overwrite with mine" is in flight (or failed for another reason) the dialog stays open.
  const [overwriting, setOverwriting] = useState<TStored | null>(null);
  const conflict = isStaleWrite(mutation.error) ? (mutation.error.current as TStored) : null;
  const current = conflict ?? overwriting;

  const close = () => {
    setOverwriting(null);
    mutation.reset();
  };
  return (
    <SaveConflictDialog
      open={current !== null}
      what={what}
      busy={mutation.isPending}
      error={conflict ? null : mutation.error}
      onClose={close}
      onReload={() => {
        if (current) queryClient.setQueryData(queryKey, current);
        close();
      }}
      onOverwrite={() => {
        if (!current || !mutation.variables) return;
        setOverwriting(current);
        mutation.mutate(
          { body: mutation.variables.body, version: current.version },
          {
            onSuccess: (saved) => {
              setOverwriting(null);
              onOverwritten?.(saved);
            },
          },
        );
      }}
    />
  );
}

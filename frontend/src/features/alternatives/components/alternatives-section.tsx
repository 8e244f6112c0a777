import { Alert, Button, Chip, Link, List, ListItem, ListItemText, Paper, Stack, Typography } from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import type { AdoptAlternativeResult, Alternative } from '../../../api/types';
import { ConfirmDialog } from '../../../components/confirm-dialog';
import { ErrorAlert } from '../../../components/feedback';
import { paths } from '../../../config/paths';
import { useUnits } from '../../../lib/units';
import { useAdoptAlternative, useDeleteAlternative } from '../mutations';
import { houseAlternativesQueryOptions } from '../queries';
import { MAX_SIDE_BY_SIDE } from '../side-by-side-selection';
import { changesSentence } from '../changed-fields';

/** The house's saved alternatives, with the way to the side-by-side page and the season of each. */
export function AlternativesSection({
  houseId,
  canWrite,
  canAdopt,
  canRun,
  onAdopted,
  currency,
}: {
  houseId: number;
  /** the farm's currency (ISO 4217) for the alternatives' costs */
  currency: string;
  /** alternative:write */
  canWrite: boolean;
  /** house:write: may make an alternative the house */
  canAdopt: boolean;
  /** estimate:run */
  canRun: boolean;
  onAdopted: (result: AdoptAlternativeResult) => void;
}) {
  const units = useUnits();
  const alternatives = useQuery(houseAlternativesQueryOptions(houseId));
  const remove = useDeleteAlternative();
  const adopt = useAdoptAlternative();
  const [deleting, setDeleting] = useState<Alternative | null>(null);
  const [adopting, setAdopting] = useState<Alternative | null>(null);
  const list = alternatives.data ?? [];

  return (
    <Paper component="section" aria-labelledby="alternatives-heading" sx={{ p: 2 }}>
      <Stack spacing={1.5}>
        <Typography id="alternatives-heading" variant="h3" component="h2">
          Alternatives
        </Typography>
        <ErrorAlert error={alternatives.error} title="Alternatives could not be loaded" />
        <ErrorAlert error={remove.error ?? adopt.error} title="Not done" />
        {list.length === 0 && alternatives.isSuccess ? (
          <Typography color="text.secondary">
            None yet. Edit the form and choose “Save as alternative” to keep a what-if without changing the house.
          </Typography>
        ) : null}
        {list.length > 0 ? (
          <List dense disablePadding>
            {list.map((alt) => (
              <ListItem key={alt.id} disableGutters sx={{ flexWrap: 'wrap', gap: 1, alignItems: 'flex-start' }}>
                <ListItemText
                  sx={{ flex: '1 1 14rem', minWidth: 0 }}
                  primary={alt.name}
                  secondary={
                    <>
                      {changesSentence(alt.changedFields)}
                      {alt.calendar ? ', own calendar' : ''}
                      {alt.costAmount !== null
                        ? ` · cost ${units.money(alt.costAmount, currency, 0)}`
                        : ' · no cost entered'}
                      {alt.createdByName ? ` · by ${alt.createdByName}` : ''}
                    </>
                  }
                />
                {alt.invalid ? (
                  <Chip
                    color="warning"
                    size="small"
                    label={`Invalid now: ${alt.invalid.field}`}
                    title={alt.invalid.message}
                  />
                ) : null}
                <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap', gap: 1 }}>
                  {canRun && !alt.invalid ? (
                    <Button size="small" component={RouterLink} to={paths.houseSeason(houseId, alt.id)}>
                      Season
                    </Button>
                  ) : null}
                  {canAdopt && !alt.invalid ? (
                    <Button size="small" onClick={() => setAdopting(alt)}>
                      Make this the house
                    </Button>
                  ) : null}
                  {canWrite ? (
                    <Button size="small" color="error" onClick={() => setDeleting(alt)}>
                      Delete
                    </Button>
                  ) : null}
                </Stack>
              </ListItem>
            ))}
          </List>
        ) : null}
        {list.some((alt) => alt.invalid) ? (
          <Alert severity="warning">
            An alternative marked invalid no longer makes a valid house with the house as it is now (hover the mark for
            why). It is kept; edit the house back or delete it.
          </Alert>
        ) : null}
        {canRun && list.length > 0 ? (
          <Link
            component={RouterLink}
            to={paths.houseSideBySide(
              houseId,
              list.slice(-MAX_SIDE_BY_SIDE).map((alt) => alt.id),
            )}
            sx={{ alignSelf: 'flex-start' }}
          >
            Compare side by side →
          </Link>
        ) : null}
      </Stack>
      <ConfirmDialog
        open={deleting !== null}
        title={`Delete “${deleting?.name ?? ''}”?`}
        message="The alternative is removed for every member of the farm. The house is not changed."
        confirmLabel="Delete alternative"
        busy={remove.isPending}
        onClose={() => setDeleting(null)}
        onConfirm={() => deleting && remove.mutate(deleting.id, { onSettled: () => setDeleting(null) })}
      />
      <ConfirmDialog
        open={adopting !== null}
        title={`Make “${adopting?.name ?? ''}” the house?`}
        message="The house takes this alternative’s values (and its calendar, if it has one) for every member of the farm. The house as it is now is kept as an alternative, so you can go back."
        confirmLabel="Make this the house"
        busy={adopt.isPending}
        onClose={() => setAdopting(null)}
        onConfirm={() =>
          adopting &&
          adopt.mutate(adopting.id, {
            onSuccess: onAdopted,
            onSettled: () => setAdopting(null),
          })
        }
      />
    </Paper>
  );
}

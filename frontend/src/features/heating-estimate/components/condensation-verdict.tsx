import { Alert, Chip, Stack, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import type { HeatingEstimate, ReferenceData } from '../../../api/types';
import type { Units } from '../../../lib/units';
import { coveringOf, NO_WRAP, SURFACE_LABELS } from '../heating-display';

/** Condensation on the design night: the verdict, then each surface with its covering and the outdoor temperature it drips below. */
export function CondensationVerdict({
  estimate,
  units,
  referenceData,
}: {
  estimate: HeatingEstimate;
  units: Units;
  referenceData: ReferenceData | undefined;
}) {
  const condensation = estimate.condensation;
  const dripping = condensation.surfaces.filter((surface) => surface.condenses);
  return (
    <Stack spacing={1}>
      <Alert severity={condensation.anyCondenses ? 'warning' : 'success'} data-testid="condensation-verdict">
        {condensation.anyCondenses
          ? `Water condenses on the ${dripping.map((surface) => SURFACE_LABELS[surface.group].toLowerCase()).join(', ')} on the design night.`
          : 'No condensation on the coverings on the design night.'}{' '}
        Inside dew point {units.format('temperature', condensation.dewPointC)} at{' '}
        {units.format('temperature', condensation.insideC)} and {condensation.insideRelativeHumidityPct} % RH.
      </Alert>
      <Table size="small" aria-label="Condensation by surface">
        <TableHead>
          <TableRow>
            <TableCell>Surface</TableCell>
            <TableCell align="right">Inside surface</TableCell>
            <TableCell align="right">Drips below outdoor</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {condensation.surfaces.map((surface) => {
            const covering = coveringOf(referenceData, surface.coveringId);
            return (
              <TableRow key={surface.group}>
                <TableCell>
                  <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
                    <span>{SURFACE_LABELS[surface.group]}</span>
                    <Chip
                      size="small"
                      color={surface.condenses ? 'warning' : 'success'}
                      variant="outlined"
                      label={surface.condenses ? 'drips' : 'dry'}
                    />
                  </Stack>
                  <Typography variant="caption" color="text.secondary" component="div">
                    {covering.layers ? <strong>{covering.layers}: </strong> : null}
                    {covering.label}, U {units.format('uValue', surface.uWPerM2K)}
                  </Typography>
                </TableCell>
                <TableCell align="right" sx={NO_WRAP}>
                  {units.format('temperature', surface.insideSurfaceC)}
                  <Typography variant="caption" color="text.secondary" component="div">
                    dew point {units.format('temperature', condensation.dewPointC)}
                  </Typography>
                </TableCell>
                <TableCell align="right" sx={NO_WRAP}>
                  {units.format('temperature', surface.condensationBelowOutdoorC)}
                </TableCell>
              </TableRow>
            );
          })}
        </TableBody>
      </Table>
    </Stack>
  );
}

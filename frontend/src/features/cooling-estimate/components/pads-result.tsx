import { Alert, Grid, Stack } from '@mui/material';
import type { CoolingEstimate, ReferenceData } from '../../../api/types';
import { Figure, formatPercent } from '../../../components/estimate-parts';
import { referenceLabel } from '../../../lib/reference-data';
import type { Units } from '../../../lib/units';

/** The evaporative pads entered: enough or short, face velocity, efficiency and the air they deliver at the peak. */
export function PadsResult({
  estimate,
  units,
  referenceData,
}: {
  estimate: CoolingEstimate;
  units: Units;
  referenceData: ReferenceData | undefined;
}) {
  const pads = estimate.pads;
  if (!pads) return null;
  return (
    <Stack spacing={1}>
      <Alert severity={pads.verdict === 'adequate' ? 'success' : 'warning'}>
        {referenceLabel(referenceData, 'evaporative-pads', pads.padTypeId)}:{' '}
        {pads.verdict === 'adequate'
          ? `${units.format('area', pads.areaM2)} is enough (${units.format('area', pads.areaNeededM2)} needed).`
          : `${units.format('area', pads.areaM2)} is short of the ${units.format('area', pads.areaNeededM2)} needed at the design face velocity.`}
      </Alert>
      <Grid container spacing={2}>
        <Grid size={6}>
          <Figure label="Face velocity" value={units.format('velocity', pads.faceVelocityMPerS)} />
        </Grid>
        <Grid size={6}>
          <Figure label="Saturation efficiency" value={formatPercent(pads.saturationEfficiency)} />
        </Grid>
        <Grid size={6}>
          <Figure
            label="Air leaving the pads at the peak"
            value={units.format('temperature', pads.leavingAirAtPeakC)}
          />
        </Grid>
        <Grid size={6}>
          <Figure
            label="Peak indoor with pads"
            value={units.format('temperature', estimate.designDay.peakIndoorWithPadsC)}
          />
        </Grid>
      </Grid>
    </Stack>
  );
}

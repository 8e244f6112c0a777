import { Chip, Grid, Stack } from '@mui/material';
import type { CoolingEstimate } from '../../../api/types';
import { Figure } from '../../../components/estimate-parts';
import type { Units } from '../../../lib/units';
import { formatFixed } from '../cooling-display';

/** Air changes and flows of the installed fans against the required exhaust, and the inlet area. */
export function AirExchangeFigures({
  estimate,
  floorAreaM2,
  units,
}: {
  estimate: CoolingEstimate;
  /** floor area of the house shown, m² (for the required rate per floor area) */
  floorAreaM2: number;
  units: Units;
}) {
  return (
    <Grid container spacing={2}>
      <Grid size={6}>
        <Figure
          label="Air changes with all fans"
          value={`${formatFixed(estimate.airExchange.airChangesPerHour, 1)} per hour · ${formatFixed(
            estimate.airExchange.airChangesPerMinute,
            2,
          )} per minute`}
        />
      </Grid>
      <Grid size={6}>
        <Figure
          label="Installed flow per floor area"
          value={units.format('airFlowPerFloorArea', estimate.airExchange.flowPerFloorAreaM3PerSM2)}
        />
      </Grid>
      <Grid size={6}>
        <Figure label="Installed exhaust" value={units.format('airFlow', estimate.capacity.installedFlowM3PerS)} />
      </Grid>
      <Grid size={6}>
        <Figure
          label="Required exhaust"
          value={`${units.format('airFlow', estimate.capacity.requiredFlowM3PerS)} (${units.format(
            'airFlowPerFloorArea',
            floorAreaM2 > 0 ? estimate.capacity.requiredFlowM3PerS / floorAreaM2 : null,
          )})`}
        />
      </Grid>
      <Grid size={12}>
        <Figure
          label="Inlet free area"
          value={
            <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }} component="span">
              <span>
                {units.format('area', estimate.capacity.inletAreaM2)} entered,{' '}
                {units.format('area', estimate.capacity.inletAreaNeededM2)} needed
              </span>
              <Chip
                size="small"
                variant="outlined"
                color={estimate.capacity.inletVerdict === 'adequate' ? 'success' : 'warning'}
                label={estimate.capacity.inletVerdict === 'adequate' ? 'enough' : 'too small'}
              />
            </Stack>
          }
        />
      </Grid>
    </Grid>
  );
}

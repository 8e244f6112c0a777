import { Grid, Typography } from '@mui/material';
import type { CoolingEstimate } from '../../../api/types';
import { Figure, formatPercent } from '../../../components/estimate-parts';
import type { Units } from '../../../lib/units';
import { formatFixed } from '../cooling-display';

/** The winter humidity fan stage: its rate, air changes and the heat it costs against the house's own loss. */
export function WinterFanStage({
  winterVentilation,
  units,
}: {
  winterVentilation: CoolingEstimate['winterVentilation'];
  units: Units;
}) {
  return (
    <>
      <Grid container spacing={2}>
        <Grid size={6}>
          <Figure
            label={`Rate (${formatPercent(winterVentilation.fractionOfSummerRate)} of summer)`}
            value={units.format('airFlow', winterVentilation.flowM3PerS)}
          />
        </Grid>
        <Grid size={6}>
          <Figure label="Air changes" value={`${formatFixed(winterVentilation.airChangesPerHour, 1)} per hour`} />
        </Grid>
        <Grid size={6}>
          <Figure
            label={`Heat to warm it at ${units.format('temperature', winterVentilation.atOutdoorC)} outdoors`}
            value={units.format('power', winterVentilation.heatCostW)}
          />
        </Grid>
        <Grid size={6}>
          <Figure label="The house's own loss then" value={units.format('power', winterVentilation.houseHeatLossW)} />
        </Grid>
      </Grid>
      <Typography variant="body2" color="text.secondary" sx={{ mt: 1 }}>
        The winter fan stage is for cool sunny days and short humidity purges, not for running all night.
      </Typography>
    </>
  );
}

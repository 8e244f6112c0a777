import { Box, Grid, Typography } from '@mui/material';
import type { HeatingConditionsSource, HeatingEstimate } from '../../../api/types';
import { Figure } from '../../../components/estimate-parts';
import type { Units } from '../../../lib/units';
import { sourceWord } from '../heating-display';

/** The design night's conditions, each with where it came from, and the design heat loss. */
export function DesignNightFigures({
  estimate,
  conditionsSource,
  showingEdits,
  units,
}: {
  estimate: HeatingEstimate;
  /** where each condition came from */
  conditionsSource: HeatingConditionsSource;
  showingEdits: boolean;
  units: Units;
}) {
  return (
    <>
      <Grid container spacing={2}>
        <Grid size={6}>
          <Figure
            label={`Design outdoor (${sourceWord(conditionsSource.designOutdoorC)})`}
            value={units.format('temperature', estimate.heatLoss.outsideC)}
          />
        </Grid>
        <Grid size={6}>
          <Figure
            label={`Inside (${sourceWord(conditionsSource.insideC)}${showingEdits ? ', unsaved' : ''})`}
            value={units.format('temperature', estimate.heatLoss.insideC)}
          />
        </Grid>
        <Grid size={6}>
          <Figure
            label={`Inside RH (${sourceWord(conditionsSource.insideRelativeHumidityPct)})`}
            value={`${estimate.condensation.insideRelativeHumidityPct} %`}
          />
        </Grid>
        <Grid size={6}>
          <Figure
            label={`Curtain (${sourceWord(conditionsSource.curtainClosed)})`}
            value={estimate.heatLoss.curtainApplied ? 'drawn, credited' : 'open'}
          />
        </Grid>
      </Grid>

      <Box>
        <Typography variant="caption" color="text.secondary" component="div">
          Design heat loss (ΔT {units.format('temperatureDifference', estimate.heatLoss.deltaTK)})
        </Typography>
        <Typography variant="h4" component="p" data-testid="heating-total" sx={{ fontSize: '1.6rem' }}>
          {units.format('power', estimate.heatLoss.totalW)}
        </Typography>
      </Box>
    </>
  );
}

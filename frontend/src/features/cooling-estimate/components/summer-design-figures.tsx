import { Grid } from '@mui/material';
import type { CoolingEstimate, HouseCoolingEstimate } from '../../../api/types';
import { Figure } from '../../../components/estimate-parts';
import type { Units } from '../../../lib/units';
import { coolingSourceWord } from '../cooling-display';

/** The summer design conditions the estimate used, each with where it came from. */
export function SummerDesignFigures({
  conditionsUsed,
  conditionsSource,
  designDay,
  units,
}: {
  conditionsUsed: HouseCoolingEstimate['conditionsUsed'];
  conditionsSource: HouseCoolingEstimate['conditionsSource'];
  designDay: CoolingEstimate['designDay'];
  units: Units;
}) {
  return (
    <Grid container spacing={2}>
      <Grid size={6}>
        <Figure
          label={`Summer design dry bulb (${coolingSourceWord(conditionsSource.summerDesignC)})`}
          value={units.format('temperature', conditionsUsed.summerDesignC)}
        />
      </Grid>
      <Grid size={6}>
        <Figure
          label={`Coincident wet bulb (${coolingSourceWord(conditionsSource.summerDesignWetBulbC)})`}
          value={units.format('temperature', conditionsUsed.summerDesignWetBulbC)}
        />
      </Grid>
      <Grid size={6}>
        <Figure
          label={`Daily range (${coolingSourceWord(conditionsSource.dailyRangeK)})`}
          value={units.format('temperatureDifference', conditionsUsed.dailyRangeK)}
        />
      </Grid>
      <Grid size={6}>
        <Figure label={`Design day (${coolingSourceWord(conditionsSource.designDate)})`} value={designDay.date} />
      </Grid>
    </Grid>
  );
}

import { Stack, Typography } from '@mui/material';
import type { HouseSeasonEstimate } from '../../../api/types';
import { useUnits } from '../../../lib/units';
import { Fact } from './fuel-cautions';

type SeasonLamps = NonNullable<HouseSeasonEstimate['lamps']>;

/**
 * What the house's supplemental lamps do over the season: the electricity they add, the part of
 * it that heats the house, and the heat, fuel and money that heat saves. Nothing without lamps.
 */
export function SeasonLampsSummary({ season }: { season: HouseSeasonEstimate }) {
  const units = useUnits();
  const lamps: SeasonLamps | null = season.lamps;
  if (!lamps) return null;
  const currency = season.inputsUsed.currency;
  return (
    <Stack spacing={1} component="section" aria-labelledby="season-lamps-heading" data-testid="season-lamps">
      <Typography id="season-lamps-heading" variant="h4" component="h3">
        Supplemental lamps{lamps.lampTypeLabel ? `: ${lamps.lampTypeLabel}` : ''}
      </Typography>
      <Stack direction="row" spacing={3} useFlexGap sx={{ flexWrap: 'wrap' }}>
        <Fact
          label="Lamp electricity added"
          value={units.format('energyKWh', lamps.electricityKWh)}
          testId="season-lamps-electricity"
        />
        <Fact label="Lamp heat into the house" value={units.format('energyKWh', lamps.heatToHouseKWh)} />
        <Fact
          label="Heater heat saved"
          value={units.format('energyKWh', lamps.heatSavedKWh)}
          testId="season-lamps-heat-saved"
        />
        <Fact label="Fuel saved" value={units.fuel(lamps.fuelSaved, season.fuel)} testId="season-lamps-fuel-saved" />
        <Fact
          label={`Fuel cost saved (${currency})`}
          value={lamps.fuelSaved.cost === null ? 'needs a fuel price' : units.money(lamps.fuelSaved.cost, currency, 0)}
        />
      </Stack>
      <Typography variant="body2" color="text.secondary">
        {units.format('powerPerFloorArea', lamps.powerDensityWPerM2)} ({units.format('power', lamps.electricW)} while
        they run), {units.format('fraction', lamps.heatToHouseFraction)} of it as heat in the house. They run before
        sunrise for the hours set for each month, on heated days only; their heat counts only up to what the house loses
        in that hour, so {units.format('fraction', lamps.usefulShareOfHeat)} of it replaces heater heat. The electricity
        is not in the fuel cost. Heaters are sized without the lamps, which may be off on the coldest night; the lamps'
        electrical work is in the safety notes.
      </Typography>
    </Stack>
  );
}

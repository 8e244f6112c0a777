import type { HouseSpec } from '../house.types';
import { demoClimate, demoSeasonInput } from '../season/demo-season';
import { applyHousePatch, type HousePatch } from './house-patch';
import type { SideBySideColumnInput } from './side-by-side';

/**
 * A demo-like side-by-side workload (specs and the benchmark): a single-poly house on the demo
 * farm and four alternatives a grower would weigh. Costs are invented round numbers.
 */
export const DEMO_ALTERNATIVES: Array<{ name: string; patch: HousePatch; costMoney: number | null }> = [
  {
    name: 'Inflated double poly, roof and sidewalls',
    patch: { coverings: { roof: 'poly-double-inflated', sidewalls: 'poly-double-inflated' } },
    costMoney: 4200,
  },
  {
    name: 'Double poly with IR inner film',
    patch: { coverings: { roof: 'poly-double-ir-inner', sidewalls: 'poly-double-ir-inner' } },
    costMoney: 5100,
  },
  { name: 'Perimeter insulation', patch: { perimeterInsulated: true }, costMoney: 900 },
  {
    name: 'Bigger heaters',
    patch: { heaters: [{ count: 3, ratedInputW: 60_000, efficiency: 0.8, fuelId: 'propane' }] },
    costMoney: null,
  },
];

export function demoSideBySideColumn(house: HouseSpec, costMoney: number | null = null): SideBySideColumnInput {
  const season = demoSeasonInput({ house, heaterEfficiency: house.heaters[0]?.efficiency ?? 0.8 });
  const climate = demoClimate();
  return {
    heating: {
      house,
      conditions: {
        designOutdoorC: climate.winterDesignC,
        elevationM: season.site.elevationM,
        insideRelativeHumidityPct: 80,
        insideC: house.setpoints.nightHeatingC,
        curtainClosed: false,
      },
    },
    cooling: {
      house,
      site: season.site,
      conditions: {
        designDate: '2026-07-21',
        summerDesignC: climate.summerDesignC,
        dailyRangeK: 11,
        summerDesignWetBulbC: climate.summerDesignWetBulbC,
        winterDesignC: climate.winterDesignC,
      },
    },
    season,
    costMoney,
  };
}

export function demoSideBySideInput(house: HouseSpec): {
  house: SideBySideColumnInput;
  alternatives: SideBySideColumnInput[];
} {
  return {
    house: demoSideBySideColumn(house),
    alternatives: DEMO_ALTERNATIVES.map((alt) =>
      demoSideBySideColumn(applyHousePatch(house, alt.patch), alt.costMoney),
    ),
  };
}

import type { HouseThermal, EnvelopePartKey } from './house-heat-loss';
import type { SimulationResult } from './season-simulation';
import type { SeasonLossBreakdown, SeasonLossPart } from './season-types';

const ENVELOPE_PARTS: readonly EnvelopePartKey[] = [
  'roof',
  'sidewalls',
  'endwalls',
  'kneewall',
  'perimeter',
  'infiltration',
];

export const SEASON_SKY_LABEL = 'Radiation to the night sky (through the roof and from the coverings)';

/**
 * The season's heat by part, like the design night's breakdown: each part of UA times the
 * degree-hours of the hours that lose heat (curtain open by day, drawn at night), and the sky's
 * part at night; the sun's offset and the heat the heaters could not deliver are taken off, so
 *   Σ parts − sun − unmet = the heat delivered.
 * For the house's own run (curtain drawn at night where it has one, sky and sun counted).
 */
export function seasonLossBreakdown(thermal: HouseThermal, result: SimulationResult): SeasonLossBreakdown {
  const lostWh: Array<[SeasonLossPart['key'], string, number]> = [];
  for (const key of ENVELOPE_PARTS) {
    const label = thermal.partLabels[key];
    if (label === undefined) continue;
    lostWh.push([
      key,
      label,
      thermal.partsOpenWPerK[key] * result.dayDegreeHoursKh + thermal.partsClosedWPerK[key] * result.nightDegreeHoursKh,
    ]);
  }
  lostWh.push(['sky', SEASON_SKY_LABEL, result.skyWh]);
  const totalWh = lostWh.reduce((sum, [, , wh]) => sum + wh, 0);
  return {
    parts: lostWh.map(([key, label, wh]) => ({
      key,
      label,
      energyKWh: wh / 1000,
      share: totalWh > 0 ? wh / totalWh : 0,
    })),
    lostKWh: totalWh / 1000,
    skyKWh: result.skyWh / 1000,
    solarOffsetKWh: result.solarOffsetWh / 1000,
    unmetHeatKWh: result.unmetHeatWh / 1000,
    deliveredKWh: result.totalHeatWh / 1000,
  };
}

import { EngineInputError } from './errors';
import { computeHouseGeometry } from './geometry/house-geometry';
import { combustionSafety, type CombustionSafety } from './heating/combustion-safety';
import { condensationRisk, type CondensationResult } from './heating/condensation';
import { designHeatLoss, heatLossCoefficients, withSkyLoss, type HeatLossBreakdown } from './heating/heat-loss';
import { sizeHeaters, type HeaterSizingResult } from './heating/heater-sizing';
import { clearNightSkyLoss, type ClearNightSky } from './heating/clear-night';
import { assumptionFromRow, heatingAssumptions, type HeatingAssumption } from './heating/heating-assumptions';
import { heatingCautions } from './heating/heating-cautions';
import { validateHeatingConditions, type HeatingConditions } from './heating/heating-conditions';
import { type HouseSpec } from './house.types';
import { insideAirDensityKgPerM3 } from './psychrometrics/psychrometrics';
import type { ReferenceData } from './reference-data.types';
import { SURFACE_GROUPS, quantityToken } from './vocabulary';
import { LAMP_SIZING_ROW_ID, lampElectricalCaution, lampMethodRow, lampPower, validateLamps } from './lamps/lamps';

export type { HeatingAssumption } from './heating/heating-assumptions';
export type { HeatingConditions } from './heating/heating-conditions';

export interface HeatingEstimateInput {
  house: HouseSpec;
  conditions: HeatingConditions;
}

export interface HeatingEstimate {
  geometry: {
    floorAreaM2: number;
    roofAreaM2: number;
    sidewallAreaM2: number;
    endwallAreaM2: number;
    /** opaque kneewall on the sidewalls and endwalls, m² (0 without one) */
    kneewallAreaM2: number;
    coverAreaM2: number;
    perimeterM: number;
    volumeM3: number;
  };
  heatLoss: HeatLossBreakdown;
  heater: HeaterSizingResult;
  condensation: CondensationResult;
  /** the house's supplemental lamps on the design night: shown, never credited; null without lamps */
  lamps: HeatingLamps | null;
  assumptions: HeatingAssumption[];
  /** may hold {{kind:valueSI}} quantity tokens (see prose.ts), as may assumption labels */
  cautions: string[];
}

export interface HeatingLamps {
  /** electrical input of all the lamps while they run, W */
  electricW: number;
  /** heat they give the house while they run, W */
  heatW: number;
  /** heat credited against the design heat loss and the heater sizing: always 0, W */
  creditedW: 0;
  /** the share of the design heat loss the lamps would cover while they run (for the reader), 0–… */
  shareOfDesignLoss: number;
}

/**
 * Design-night heating estimate for one house: heat loss with its breakdown, heater sizing,
 * condensation on the coverings, every assumption used and the cautions that go with it.
 */
export function estimateHeating(input: HeatingEstimateInput, ref: ReferenceData): HeatingEstimate {
  if (!input || typeof input !== 'object') throw new EngineInputError('house', 'house is required');
  const { house, conditions } = input;
  const geometry = computeHouseGeometry(house);
  const insideC = validateHeatingConditions(conditions, house);
  const lamps = validateLamps(house.lamps, 'house.lamps', ref);
  const outsideC = conditions.designOutdoorC;
  const curtainClosed = conditions.curtainClosed ?? false;

  const air = insideAirDensityKgPerM3(insideC, conditions.insideRelativeHumidityPct, conditions.elevationM);
  const coefficients = heatLossCoefficients(house, geometry, ref, {
    curtainClosed,
    airDensityKgPerM3: air.airDensityKgPerM3,
    windSpeedMPerS: conditions.designWindSpeedMPerS ?? undefined,
  });
  const clearNight: ClearNightSky | null = conditions.clearSky
    ? clearNightSkyLoss({ conditions, curtainClosed: coefficients.curtainApplied, geometry, coefficients }, ref)
    : null;
  const tabulated = designHeatLoss(coefficients, geometry, insideC, outsideC);
  const heatLoss = clearNight ? withSkyLoss(tabulated, geometry.floorAreaM2, clearNight.totalW) : tabulated;
  const sizing = sizeHeaters(
    {
      designHeatLossW: heatLoss.totalW,
      totalConductanceWPerK: coefficients.totalWPerK,
      fixedLossW: heatLoss.skyW,
      insideC,
      heaters: house.heaters,
    },
    ref,
  );
  const condensation = condensationRisk(
    { insideC, outsideC, insideRelativeHumidityPct: conditions.insideRelativeHumidityPct },
    SURFACE_GROUPS.map((group) => ({
      group,
      coveringId: coefficients.rows.coverings[group].id,
      // the covering's U at the design wind (the curtain is not credited for the cover's own surface)
      uWPerM2K: coefficients.coveringUWPerM2K[group] * coefficients.wind.uFactor[group],
      // under a clear sky the covering loses as if the air were colder
      skyCoolingK: clearNight?.coverCoolingK[group] ?? 0,
    })),
    ref,
  );

  // fuel-fired heaters bring their combustion-safety cautions and the reference rows behind them
  const combustion: CombustionSafety = sizing.result.fuelFired
    ? combustionSafety(sizing.fuelFiredInputW, sizing.unventedInputW, ref)
    : { cautions: [], rows: [] };
  const assumptions: HeatingAssumption[] = [
    ...heatingAssumptions({ conditions, insideC, geometry, coefficients, air, condensation, sizing }),
    ...(clearNight?.assumptions ?? []),
    ...combustion.rows.map(({ row, value, unit }) =>
      assumptionFromRow(row, `safety.${row.id}`, row.label, value, unit),
    ),
  ];
  let lampResult: HeatingLamps | null = null;
  if (lamps) {
    const power = lampPower(lamps, geometry.floorAreaM2);
    lampResult = {
      ...power,
      creditedW: 0,
      shareOfDesignLoss: heatLoss.totalW > 0 ? power.heatW / heatLoss.totalW : 0,
    };
    const sizingRow = lampMethodRow(ref, LAMP_SIZING_ROW_ID);
    assumptions.push(
      assumptionFromRow(
        sizingRow,
        'lamps.notCredited',
        `${sizingRow.label ?? LAMP_SIZING_ROW_ID}: the lamps' ${quantityToken('power', power.heatW)} of heat while they run is left out`,
        0,
        'W',
      ),
    );
  }
  const cautions = heatingCautions(
    {
      house,
      conditions,
      insideC,
      geometry,
      coefficients,
      airDensityKgPerM3: air.airDensityKgPerM3,
      heatLoss,
      sizing,
      condensation,
      combustionCautions: combustion.cautions,
    },
    ref,
  ).concat(clearNight?.cautions ?? [], lampResult ? [lampElectricalCaution(lampResult)] : []);

  return {
    geometry: {
      floorAreaM2: geometry.floorAreaM2,
      roofAreaM2: geometry.roofAreaM2,
      sidewallAreaM2: geometry.sidewallAreaM2,
      endwallAreaM2: geometry.endwallAreaM2,
      kneewallAreaM2: geometry.kneewallAreaM2,
      coverAreaM2: geometry.coverAreaM2,
      perimeterM: geometry.perimeterM,
      volumeM3: geometry.volumeM3,
    },
    heatLoss,
    heater: sizing.result,
    condensation: condensation.result,
    lamps: lampResult,
    assumptions,
    cautions,
  };
}

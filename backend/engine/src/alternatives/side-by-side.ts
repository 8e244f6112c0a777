/**
 * The house and its alternatives side by side: each column is the same three estimates a single
 * house gets (design-night heating, summer cooling, the season), plus the light its coverings let
 * through and, for an alternative, what it saves against the house and how soon its cost returns.
 */
import { EngineInputError } from '../errors';
import { estimateCooling, type CoolingEstimate, type CoolingInput } from '../estimate-cooling';
import { estimateHeating, type HeatingEstimate, type HeatingEstimateInput } from '../estimate-heating';
import { estimateSeason, type EstimateSeasonInput, type SeasonEstimate } from '../estimate-season';
import type { CoveringRow } from '../heating/heating-reference';
import { referenceRow, type ReferenceData } from '../reference-data.types';
import { costDifference } from '../season/fuel';
import { SunCache } from '../season/sun-hours';
import { SURFACE_GROUPS, type SurfaceGroup } from '../vocabulary';

export interface SideBySideColumnInput {
  heating: HeatingEstimateInput;
  cooling: CoolingInput;
  season: EstimateSeasonInput;
  /** installed cost of the alternative, money in the currency of the fuel price; null = not entered */
  costMoney: number | null;
}

export interface SurfaceLight {
  group: SurfaceGroup;
  coveringId: string;
  coveringLabel: string;
  /** share of daylight the covering lets through, 0–1 (reference value) */
  lightTransmittance: number;
  /** this covering's transmittance ÷ the house's − 1 (negative = light lost); 0 for the house */
  changeFromHouse: number;
}

export type PaybackStatus = 'years' | 'immediate' | 'enter-cost' | 'enter-price' | 'never';

export interface VersusHouse {
  /** house season cost − this column's, money a year (positive = saves); null without a fuel price */
  yearlySaving: number | null;
  /** heat delivered to the house, house − this column, kWh */
  heatSavedKWh: number;
  /** heat content of the fuel burnt, house − this column, kWh */
  fuelInputSavedKWh: number;
  /** design-night heat loss, this column − house, W */
  designHeatLossChangeW: number;
  /** cost ÷ yearly saving, years; null unless status is 'years' */
  paybackYears: number | null;
  paybackStatus: PaybackStatus;
}

export interface SideBySideColumn {
  heating: HeatingEstimate;
  cooling: CoolingEstimate;
  season: SeasonEstimate;
  light: SurfaceLight[];
  costMoney: number | null;
  /** null for the house's own column */
  versusHouse: VersusHouse | null;
}

export type SideBySideOutcome = { ok: true; column: SideBySideColumn } | { ok: false; field: string; message: string };

function coveringRow(ref: ReferenceData, id: string, field: string): CoveringRow {
  const row = referenceRow<CoveringRow>(ref, 'coverings', id);
  if (!row) throw new EngineInputError(field, `unknown covering ${id}`);
  return row;
}

function lightOf(input: SideBySideColumnInput, ref: ReferenceData, house: SurfaceLight[] | null): SurfaceLight[] {
  return SURFACE_GROUPS.map((group, i) => {
    const id = input.heating.house.coverings[group];
    const row = coveringRow(ref, id, `house.coverings.${group}`);
    const base = house?.[i].lightTransmittance;
    return {
      group,
      coveringId: id,
      coveringLabel: row.label ?? id,
      lightTransmittance: row.lightTransmittance,
      changeFromHouse: base ? row.lightTransmittance / base - 1 : 0,
    };
  });
}

export function paybackOf(
  costMoney: number | null,
  yearlySaving: number | null,
): { paybackYears: number | null; paybackStatus: PaybackStatus } {
  if (yearlySaving === null) return { paybackYears: null, paybackStatus: 'enter-price' };
  if (costMoney === null) return { paybackYears: null, paybackStatus: 'enter-cost' };
  if (costMoney <= 0 && yearlySaving >= 0) return { paybackYears: null, paybackStatus: 'immediate' };
  if (!(yearlySaving > 0)) return { paybackYears: null, paybackStatus: 'never' };
  return { paybackYears: costMoney / yearlySaving, paybackStatus: 'years' };
}

function computeColumn(input: SideBySideColumnInput, ref: ReferenceData, sunCache: SunCache) {
  return {
    heating: estimateHeating(input.heating, ref),
    cooling: estimateCooling(input.cooling, ref),
    season: estimateSeason(input.season, ref, sunCache),
  };
}

/**
 * Compares the house (first column) with each alternative. The house's own column must compute
 * (its errors are thrown); an alternative that the engine cannot compute with is returned as
 * `{ ok: false, field, message }` in its place, so one bad alternative never hides the others.
 */
export function compareSideBySide(
  house: SideBySideColumnInput,
  alternatives: SideBySideColumnInput[],
  ref: ReferenceData,
  sunCache: SunCache = new SunCache(),
): { house: SideBySideColumn; alternatives: SideBySideOutcome[] } {
  const houseResult = computeColumn(house, ref, sunCache);
  const houseLight = lightOf(house, ref, null);
  const houseColumn: SideBySideColumn = {
    ...houseResult,
    light: houseLight,
    costMoney: house.costMoney,
    versusHouse: null,
  };
  const outcomes = alternatives.map((alternative): SideBySideOutcome => {
    try {
      const result = computeColumn(alternative, ref, sunCache);
      const yearlySaving = costDifference(houseResult.season.total.cost, result.season.total.cost);
      return {
        ok: true,
        column: {
          ...result,
          light: lightOf(alternative, ref, houseLight),
          costMoney: alternative.costMoney,
          versusHouse: {
            yearlySaving,
            heatSavedKWh: houseResult.season.total.energyKWh - result.season.total.energyKWh,
            fuelInputSavedKWh: houseResult.season.total.fuelInputKWh - result.season.total.fuelInputKWh,
            designHeatLossChangeW: result.heating.heatLoss.totalW - houseResult.heating.heatLoss.totalW,
            ...paybackOf(alternative.costMoney, yearlySaving),
          },
        },
      };
    } catch (error) {
      if (error instanceof EngineInputError) return { ok: false, field: error.field, message: error.message };
      throw error;
    }
  });
  return { house: houseColumn, alternatives: outcomes };
}

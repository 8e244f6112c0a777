import type { ReferenceData } from './reference-data.types';
import { isoLocalHour } from './climate/calendar-days';
import { seasonDegreeDays } from './season/degree-days';
import { fuelCautions, priceUnitLabel } from './season/fuel';
import { capacityCaution, degreeDayCrossCheck } from './season/degree-day-check';
import { baseVariant, fuelAmount, prepareSeason, runVariant } from './season/prepare-season';
import { seasonAssumptions } from './season/season-assumptions';
import { seasonLossBreakdown } from './season/loss-breakdown';
import type {
  EstimateSeasonInput,
  PreparedSeason,
  SeasonEstimate,
  SeasonLamps,
  SeasonMonth,
  SeasonVariant,
  VariantRun,
} from './season/season-types';
import { SunCache } from './season/sun-hours';
import { lampElectricalCaution, lampPower, namedLampType } from './lamps/lamps';

// The season estimate's parts live in season/: its types (season-types.ts), validation and the
// prepared hours (prepare-season.ts), the degree-day cross-check (degree-day-check.ts) and the
// assumptions (season-assumptions.ts). They are re-exported here, the estimate's front door.
export type * from './season/season-types';
export {
  SOLAR_USEFUL_FRACTION_ROW_ID,
  baseVariant,
  fuelAmount,
  installedHeaterOutput,
  prepareSeason,
  runVariant,
  variantParameters,
  type VariantOptions,
} from './season/prepare-season';
export { capacityCaution } from './season/degree-day-check';

// ---------------------------------------------------------------------------------------------
// The estimate

/**
 * Season heating energy, fuel and cost by an hourly simulation, with a degree-day cross-check
 * and the assumptions behind every number. Pass a shared `sunCache` when estimating the same
 * site repeatedly.
 */
export function estimateSeason(
  input: EstimateSeasonInput,
  ref: ReferenceData,
  sunCache: SunCache = new SunCache(),
): SeasonEstimate {
  const prepared = prepareSeason(input, ref, sunCache);
  const variant = baseVariant(prepared);
  const run = runVariant(prepared, variant, ref);
  return describeSeason(prepared, variant, run, ref);
}

function describeSeason(
  prepared: PreparedSeason,
  variant: SeasonVariant,
  run: VariantRun,
  ref: ReferenceData,
): SeasonEstimate {
  const { hours } = prepared;
  const { result, thermal, parameters } = run;
  const degreeDays = seasonDegreeDays(hours, parameters.nightSetpointC);

  const monthly: SeasonMonth[] = hours.months.map((slot, index) => ({
    year: slot.year,
    month: slot.month,
    ...fuelAmount(result.monthlyHeatWh[index] / 1000, variant),
    heatingHours: result.monthlyHeatingHours[index],
    peakW: result.monthlyPeakW[index],
    degreeDaysKDay: degreeDays.byMonthSlot[index],
    unmetHeatKWh: result.monthlyUnmetHeatWh[index] / 1000,
    hoursBelowSetpoint: result.monthlyHoursBelowSetpoint[index],
    lampElectricityKWh: run.lamps ? run.lamps.monthlyElectricWh[index] / 1000 : 0,
    lampHeatKWh: run.lamps ? run.lamps.monthlyHeatWh[index] / 1000 : 0,
    lampHeatSavedKWh: result.monthlyLampSavedHeatWh[index] / 1000,
  }));

  let heatedDays = 0;
  for (let day = 0; day < hours.dayCount; day++)
    if (parameters.daySetpointC[day] === parameters.daySetpointC[day]) heatedDays++;

  const peak =
    result.peakHourIndex >= 0
      ? {
          heatW: result.peakW,
          at: isoLocalHour(hours.firstDayNumber + Math.floor(result.peakHourIndex / 24), result.peakHourIndex % 24),
          outdoorC: hours.outdoorC[result.peakHourIndex],
        }
      : null;

  return {
    period: {
      startDate: prepared.input.season.startDate,
      endDate: prepared.input.season.endDate,
      days: hours.dayCount,
      heatedDays,
    },
    fuel: {
      fuelId: variant.fuelRow.id,
      label: variant.fuelRow.label,
      unitSi: variant.fuelRow.unitSi,
      unitUs: variant.fuelRow.unitUs,
      pricePerUnit: variant.fuel.pricePerUnit,
      priceUnit: variant.fuel.priceUnit,
      priceUnitLabel: priceUnitLabel(variant.fuelRow, variant.fuel.priceUnit),
      heaterEfficiency: variant.heaterEfficiency,
    },
    heatLoss: {
      uaCurtainOpenWPerK: thermal.uaOpenWPerK,
      uaCurtainClosedWPerK: thermal.uaClosedWPerK,
      floorAreaM2: thermal.geometry.floorAreaM2,
    },
    monthly,
    total: {
      ...fuelAmount(result.totalHeatWh / 1000, variant),
      heatingHours: result.heatingHours,
      unmetHeatKWh: result.unmetHeatWh / 1000,
      hoursBelowSetpoint: result.hoursBelowSetpoint,
    },
    heaterCapacity: {
      installedOutputW: variant.heaterOutputW,
      heaterCount: prepared.heaterCount,
      caution: capacityCaution(variant.heaterOutputW, result, 'season'),
    },
    peak,
    nightShareOfHeat: result.totalHeatWh > 0 ? result.nightHeatWh / result.totalHeatWh : 0,
    solarOffsetKWh: result.solarOffsetWh / 1000,
    lamps: seasonLamps(variant, run, ref),
    lossBreakdown: seasonLossBreakdown(thermal, result),
    degreeDays: degreeDayCrossCheck(prepared, variant, run, degreeDays.total, ref),
    assumptions: seasonAssumptions(prepared, variant, thermal, ref),
    cautions: run.lamps
      ? [...fuelCautions(variant.fuelRow), lampElectricalCaution(run.lamps)]
      : fuelCautions(variant.fuelRow),
  };
}

function seasonLamps(variant: SeasonVariant, run: VariantRun, ref: ReferenceData): SeasonLamps | null {
  const lamps = variant.house.lamps;
  if (!lamps) return null;
  const type = namedLampType(lamps, ref);
  const power = run.lamps ?? lampPower(lamps, run.thermal.geometry.floorAreaM2);
  const heatToHouseKWh = run.lamps ? run.lamps.heatWh / 1000 : 0;
  const heatSavedKWh = run.result.lampSavedHeatWh / 1000;
  return {
    lampTypeId: lamps.lampTypeId ?? null,
    lampTypeLabel: type ? (type.label ?? type.id) : null,
    powerDensityWPerM2: lamps.powerDensityWPerM2,
    hoursPerDayByMonth: [...lamps.hoursPerDayByMonth],
    heatToHouseFraction: lamps.heatToHouseFraction,
    electricW: power.electricW,
    heatW: power.heatW,
    electricityKWh: run.lamps ? run.lamps.electricWh / 1000 : 0,
    heatToHouseKWh,
    heatSavedKWh,
    fuelSaved: fuelAmount(heatSavedKWh, variant),
    usefulShareOfHeat: heatToHouseKWh > 0 ? heatSavedKWh / heatToHouseKWh : 0,
  };
}

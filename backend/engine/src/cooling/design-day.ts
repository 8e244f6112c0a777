import { maxOf } from '../numbers';
import { standardAtmosphericPressurePa } from '../psychrometrics';
import type { ReferenceData } from '../reference-data.types';
import { clearSkyIrradiance } from '../solar/clear-sky';
import { solarNoonUtc, sunPosition } from '../solar/sun-position';
import { airSpecificHeat, dailyRangeProfileRow } from './cooling-reference';
import {
  humidityRatioFromWetBulb,
  moistAirDensityFromHumidityRatioKgPerM3,
  padLeavingAirC,
  wetBulbFromHumidityRatioC,
} from './psychro';

/**
 * Design-day heat balance, hour by hour.
 *
 * Time base: hours 0–23 are local apparent solar time (hour 12 = the sun's transit), turned into
 * UTC instants with suncalc's solar noon for the date and site, so the sun's path is symmetric
 * about noon whatever the time zone or daylight-saving rule.
 *
 * Outdoor dry bulb: T(h) = T_max − daily range × fraction(h), the handbook's fraction-of-daily-
 * range profile (minimum about 05:00, maximum about 15:00), read in solar time.
 *
 * Humidity: the design humidity ratio (from the design dry bulb and its coincident wet bulb at
 * the site's standard-atmosphere pressure) is held all day; each hour's wet bulb follows from it,
 * capped at saturation on cool hours.
 *
 * Indoor: steady state each hour (no storage in floor, benches or crop):
 *   solar gain to air = G_h × τ_roof × τ_shade × (1 − transpiration share) × floor area
 *   gain = solar gain + the lamps' heat in the hours they run (cooling/design-day-lamps.ts)
 * with τ_shade the share a shade cloth in place that month passes (1 without one). The light under
 * the roof, G_h × τ_roof × τ_shade, is the one the exhaust rate's light factor reads too
 * (`designDayInteriorLightLux`), so the two never see different suns.
 *   loss = UA (T_i − T_o) + ρ c_p V̇ (T_i − T_supply)
 * with T_supply = T_o for fans alone, or the pad leaving-air temperature with pads. Fans are
 * staged continuously: they stay off while the unventilated house is at or below the cooling
 * setpoint; otherwise the fraction of installed flow that holds the setpoint is used, and with
 * all fans on and the house still above setpoint the setpoint is not held. fanFraction and
 * setpointHeld describe the house as equipped: with pads when it has pads. Heaters are not
 * modelled, so night temperatures are free-floating.
 */

export interface HourlyBalanceInput {
  solarGainW: number;
  /** heat of supplemental lamps running this hour, W (0 or absent when off) */
  lampHeatW?: number;
  /** UA of the cover, perimeter and leakage, W/K */
  conductanceWPerK: number;
  outdoorC: number;
  /** temperature of the air the fans draw in (outdoor, or pad leaving air), °C */
  supplyAirC: number;
  /** ρ·c_p·V̇ of all installed fans, W/K */
  maxVentilationWPerK: number;
  coolingSetpointC: number;
}

export interface HourlyBalance {
  indoorC: number;
  fanFraction: number;
  setpointHeld: boolean;
}

export function hourlyIndoorBalance(input: HourlyBalanceInput): HourlyBalance {
  const { conductanceWPerK, outdoorC, supplyAirC, maxVentilationWPerK, coolingSetpointC } = input;
  const solarGainW = input.solarGainW + (input.lampHeatW ?? 0);
  const unventilatedC = outdoorC + solarGainW / conductanceWPerK;
  if (unventilatedC <= coolingSetpointC) {
    return { indoorC: unventilatedC, fanFraction: 0, setpointHeld: true };
  }
  if (maxVentilationWPerK <= 0) {
    return { indoorC: unventilatedC, fanFraction: 0, setpointHeld: false };
  }
  if (coolingSetpointC > supplyAirC) {
    const neededWPerK =
      (solarGainW + conductanceWPerK * (outdoorC - coolingSetpointC)) / (coolingSetpointC - supplyAirC);
    const fraction = neededWPerK / maxVentilationWPerK;
    if (fraction <= 1) {
      return { indoorC: coolingSetpointC, fanFraction: Math.max(0, fraction), setpointHeld: true };
    }
  }
  const indoorC =
    (solarGainW + conductanceWPerK * outdoorC + maxVentilationWPerK * supplyAirC) /
    (conductanceWPerK + maxVentilationWPerK);
  return { indoorC, fanFraction: 1, setpointHeld: indoorC <= coolingSetpointC + 1e-9 };
}

/** Outdoor dry bulb for solar hours 0–23 (hour 0 = the profile's hour 24). */
export function outdoorTemperatureProfileC(summerDesignC: number, dailyRangeK: number, ref: ReferenceData): number[] {
  const fractions = dailyRangeProfileRow(ref).fractionsByHour1To24;
  return Array.from({ length: 24 }, (_, hour) => summerDesignC - dailyRangeK * fractions[hour === 0 ? 23 : hour - 1]);
}

export interface DesignDayInput {
  /** 'YYYY-MM-DD' */
  date: string;
  latitudeDeg: number;
  longitudeDeg: number;
  elevationM: number;
  summerDesignC: number;
  dailyRangeK: number;
  summerDesignWetBulbC: number;
  floorAreaM2: number;
  roofLightTransmittance: number;
  /** share of the sun a shade cloth in place on the design date passes; 1 without one */
  shadeTransmittance: number;
  transpirationFraction: number;
  conductanceWPerK: number;
  installedFlowM3PerS: number;
  coolingSetpointC: number;
  /** saturation efficiency of the pads, or null without pads */
  padSaturationEfficiency: number | null;
  /** heat of supplemental lamps in each of the 24 solar hours, W; null or absent without lamps */
  lampHeatByHourW?: number[] | null;
}

export interface DesignDayHour {
  hour: number;
  outdoorC: number;
  sunAltitudeDeg: number;
  globalHorizontalWPerM2: number;
  solarGainW: number;
  /** heat of supplemental lamps running this hour, W (0 when they are off) */
  lampHeatW: number;
  indoorWithFansC: number;
  fanFraction: number;
  indoorWithPadsC: number | null;
  setpointHeld: boolean;
}

export interface DesignDayResult {
  date: string;
  hours: DesignDayHour[];
  peakIndoorWithFansC: number;
  peakIndoorWithPadsC: number | null;
  hoursNotHeld: number[];
  /** pad leaving-air temperature at the hour of the outdoor maximum, °C (null without pads) */
  padLeavingAirAtPeakC: number | null;
  humidityRatioKgPerKg: number;
  /** highest clear-sky global horizontal irradiance outdoors in the day, W/m² */
  peakGlobalHorizontalWPerM2: number;
  /** the same under the roof and any shade cloth: peak × τ_roof × τ_shade, W/m² */
  peakInteriorIrradianceWPerM2: number;
  /** temperature of the air the installed cooling draws in each hour (outdoor, or pad leaving air), °C */
  supplyAirByHourC: number[];
}

export function designDayBalance(input: DesignDayInput, ref: ReferenceData): DesignDayResult {
  const [year, month, day] = input.date.split('-').map(Number);
  const noonUtc = solarNoonUtc(year, month, day, input.latitudeDeg, input.longitudeDeg);
  const pressurePa = standardAtmosphericPressurePa(input.elevationM);
  const humidityRatio = humidityRatioFromWetBulb(input.summerDesignC, input.summerDesignWetBulbC, pressurePa);
  const cpJPerKgK = airSpecificHeat(ref).value;
  const outdoor = outdoorTemperatureProfileC(input.summerDesignC, input.dailyRangeK, ref);
  const hourOfOutdoorPeak = outdoor.indexOf(maxOf(outdoor));
  const interiorShare = input.roofLightTransmittance * input.shadeTransmittance;
  const absorbedShare = interiorShare * (1 - input.transpirationFraction);
  const supplyAirByHourC: number[] = [];

  let padLeavingAirAtPeakC: number | null = null;
  const hours: DesignDayHour[] = outdoor.map((outdoorC, hour) => {
    const at = new Date(noonUtc.getTime() + (hour - 12) * 3_600_000);
    const sunAltitudeDeg = sunPosition(at, input.latitudeDeg, input.longitudeDeg).altitudeDeg;
    const globalHorizontalWPerM2 = clearSkyIrradiance(sunAltitudeDeg, month, ref).globalHorizontalWPerM2;
    const solarGainW = globalHorizontalWPerM2 * absorbedShare * input.floorAreaM2;
    const lampHeatW = input.lampHeatByHourW ? input.lampHeatByHourW[hour] : 0;

    const ventilation = (supplyAirC: number) =>
      moistAirDensityFromHumidityRatioKgPerM3(supplyAirC, humidityRatio, pressurePa) *
      cpJPerKgK *
      input.installedFlowM3PerS;

    const withFans = hourlyIndoorBalance({
      solarGainW,
      lampHeatW,
      conductanceWPerK: input.conductanceWPerK,
      outdoorC,
      supplyAirC: outdoorC,
      maxVentilationWPerK: ventilation(outdoorC),
      coolingSetpointC: input.coolingSetpointC,
    });

    let withPads: HourlyBalance | null = null;
    let padAirC: number | null = null;
    if (input.padSaturationEfficiency !== null) {
      const wetBulbC = wetBulbFromHumidityRatioC(outdoorC, humidityRatio, pressurePa);
      padAirC = padLeavingAirC(outdoorC, wetBulbC, input.padSaturationEfficiency);
      if (hour === hourOfOutdoorPeak) padLeavingAirAtPeakC = padAirC;
      withPads = hourlyIndoorBalance({
        solarGainW,
        lampHeatW,
        conductanceWPerK: input.conductanceWPerK,
        outdoorC,
        supplyAirC: padAirC,
        maxVentilationWPerK: ventilation(padAirC),
        coolingSetpointC: input.coolingSetpointC,
      });
    }
    // fan staging and "held" describe the cooling the house has: pads when it has them
    const installed = withPads ?? withFans;
    supplyAirByHourC.push(padAirC ?? outdoorC);

    return {
      hour,
      outdoorC,
      sunAltitudeDeg,
      globalHorizontalWPerM2,
      solarGainW,
      lampHeatW,
      indoorWithFansC: withFans.indoorC,
      fanFraction: installed.fanFraction,
      indoorWithPadsC: withPads === null ? null : withPads.indoorC,
      setpointHeld: installed.setpointHeld,
    };
  });

  const peakGlobalHorizontalWPerM2 = maxOf(hours.map((h) => h.globalHorizontalWPerM2));
  return {
    date: input.date,
    hours,
    peakIndoorWithFansC: maxOf(hours.map((h) => h.indoorWithFansC)),
    peakIndoorWithPadsC:
      input.padSaturationEfficiency === null ? null : maxOf(hours.map((h) => h.indoorWithPadsC as number)),
    hoursNotHeld: hours.filter((h) => !h.setpointHeld).map((h) => h.hour),
    padLeavingAirAtPeakC,
    humidityRatioKgPerKg: humidityRatio,
    peakGlobalHorizontalWPerM2,
    peakInteriorIrradianceWPerM2: peakGlobalHorizontalWPerM2 * interiorShare,
    supplyAirByHourC,
  };
}

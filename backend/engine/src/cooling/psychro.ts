import psychrolib = require('psychrolib');

/**
 * Wet-bulb helpers over psychrolib (ASHRAE 2017 Fundamentals ch. 1 formulations) that the shared
 * psychrometrics module does not cover. psychrolib's unit system is process-wide state, so every
 * call sets SI first.
 */
interface WetBulbFunctions {
  /** kg water / kg dry air from dry bulb °C, wet bulb °C, pressure Pa */
  GetHumRatioFromTWetBulb(dryBulbC: number, wetBulbC: number, pressurePa: number): number;
  /** wet bulb °C from dry bulb °C, humidity ratio kg/kg, pressure Pa */
  GetTWetBulbFromHumRatio(dryBulbC: number, humidityRatio: number, pressurePa: number): number;
  /** kg water / kg dry air at saturation */
  GetSatHumRatio(dryBulbC: number, pressurePa: number): number;
  /** kg moist air / m³ */
  GetMoistAirDensity(dryBulbC: number, humidityRatio: number, pressurePa: number): number;
}

function si(): WetBulbFunctions {
  psychrolib.SetUnitSystem(psychrolib.SI);
  return psychrolib as unknown as WetBulbFunctions;
}

export function humidityRatioFromWetBulb(dryBulbC: number, wetBulbC: number, pressurePa: number): number {
  return si().GetHumRatioFromTWetBulb(dryBulbC, wetBulbC, pressurePa);
}

/**
 * Wet bulb of air at `dryBulbC` carrying `humidityRatio`. Where that much water cannot stay in the
 * air at this dry bulb (a cool night on a humid design day) the air is taken as saturated, so the
 * wet bulb equals the dry bulb.
 */
export function wetBulbFromHumidityRatioC(dryBulbC: number, humidityRatio: number, pressurePa: number): number {
  const lib = si();
  const saturatedHumidityRatio = lib.GetSatHumRatio(dryBulbC, pressurePa);
  if (humidityRatio >= saturatedHumidityRatio) return dryBulbC;
  return Math.min(dryBulbC, lib.GetTWetBulbFromHumRatio(dryBulbC, Math.max(humidityRatio, 1e-7), pressurePa));
}

export function moistAirDensityFromHumidityRatioKgPerM3(
  dryBulbC: number,
  humidityRatio: number,
  pressurePa: number,
): number {
  return si().GetMoistAirDensity(dryBulbC, humidityRatio, pressurePa);
}

/**
 * Dry bulb of air leaving a wetted pad: T_db − η (T_db − T_wb), η the pad's saturation
 * efficiency (standard definition of evaporative-cooler saturation efficiency).
 */
export function padLeavingAirC(dryBulbC: number, wetBulbC: number, saturationEfficiency: number): number {
  return dryBulbC - saturationEfficiency * (dryBulbC - wetBulbC);
}

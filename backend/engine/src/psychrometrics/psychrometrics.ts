import psychrolib = require('psychrolib');

/**
 * Thin SI wrappers over psychrolib (ASHRAE 2017 Fundamentals ch. 1 formulations). psychrolib's
 * unit system is process-wide state, so every call sets SI first rather than trusting whoever
 * called it last.
 */
function si(): typeof psychrolib {
  psychrolib.SetUnitSystem(psychrolib.SI);
  return psychrolib;
}

/** Barometric pressure of the standard atmosphere at an elevation, Pa. */
export function standardAtmosphericPressurePa(elevationM: number): number {
  return si().GetStandardAtmPressure(elevationM);
}

/** Dew point of air at a dry-bulb temperature and relative humidity (percent), °C. */
export function dewPointC(dryBulbC: number, relativeHumidityPct: number): number {
  return si().GetTDewPointFromRelHum(dryBulbC, relativeHumidityPct / 100);
}

/** Wet bulb of air at a dry bulb and dew point (°C) at a pressure (Pa). */
export function wetBulbFromDewPointC(dryBulbC: number, dewPointC: number, pressurePa: number): number {
  return si().GetTWetBulbFromTDewPoint(dryBulbC, dewPointC, pressurePa);
}

/** Density of moist air (dry air plus its water vapour), kg/m³. */
export function moistAirDensityKgPerM3(dryBulbC: number, relativeHumidityPct: number, pressurePa: number): number {
  const lib = si();
  const humidityRatio = lib.GetHumRatioFromRelHum(dryBulbC, relativeHumidityPct / 100, pressurePa);
  return lib.GetMoistAirDensity(dryBulbC, humidityRatio, pressurePa);
}

/** Density of dry air, kg/m³. */
export function dryAirDensityKgPerM3(dryBulbC: number, pressurePa: number): number {
  return si().GetDryAirDensity(dryBulbC, pressurePa);
}

/**
 * Density of the inside air at the site's elevation (standard-atmosphere pressure), the density
 * infiltration heat is computed with: the air that leaks out is house air.
 */
export function insideAirDensityKgPerM3(
  insideC: number,
  insideRelativeHumidityPct: number,
  elevationM: number,
): { airDensityKgPerM3: number; pressurePa: number } {
  const pressurePa = standardAtmosphericPressurePa(elevationM);
  return {
    airDensityKgPerM3: moistAirDensityKgPerM3(insideC, insideRelativeHumidityPct, pressurePa),
    pressurePa,
  };
}

/**
 * For specs only (left out of the build): air density written out by hand with the ideal-gas law,
 * so that expected values do not come from the engine's psychrometrics (which calls psychrolib).
 *
 * - Standard-atmosphere pressure: p = 101,325 × (1 − 2.25577 × 10⁻⁵ Z)^5.2559 Pa, Z in m
 *   (ASHRAE Handbook—Fundamentals 2017, ch. 1, eq. 3).
 * - Saturation vapour pressure over water: p_ws = 610.94 × exp(17.625 t / (t + 243.04)) Pa
 *   (Magnus form, Alduchov & Eskridge 1996); 1,702 Pa at 15 °C against ASHRAE's tabulated 1,705.8 Pa.
 * - Moist air: ρ = (p − p_w) / (R_da T) + p_w / (R_w T), R_da = 287.042 J/(kg·K),
 *   R_w = 461.524 J/(kg·K), T in K, p_w = RH × p_ws.
 */
const R_DRY_AIR = 287.042;
const R_WATER_VAPOUR = 461.524;

export function standardPressureByHandPa(elevationM: number): number {
  return 101_325 * (1 - 2.25577e-5 * elevationM) ** 5.2559;
}

export function saturationPressureByHandPa(dryBulbC: number): number {
  return 610.94 * Math.exp((17.625 * dryBulbC) / (dryBulbC + 243.04));
}

export function dryAirDensityByHand(dryBulbC: number, elevationM: number): number {
  return standardPressureByHandPa(elevationM) / (R_DRY_AIR * (dryBulbC + 273.15));
}

export function moistAirDensityByHand(dryBulbC: number, relativeHumidityPct: number, elevationM: number): number {
  const pressure = standardPressureByHandPa(elevationM);
  const vapour = (relativeHumidityPct / 100) * saturationPressureByHandPa(dryBulbC);
  const kelvin = dryBulbC + 273.15;
  return (pressure - vapour) / (R_DRY_AIR * kelvin) + vapour / (R_WATER_VAPOUR * kelvin);
}

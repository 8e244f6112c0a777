/**
 * The few psychrolib 1.1.1 functions the engine calls (the package ships without types).
 * The library is a singleton whose unit system is global state, so callers go through
 * psychrometrics.ts, which sets SI before every call.
 */
declare module 'psychrolib' {
  const psychrolib: {
    readonly SI: number;
    readonly IP: number;
    SetUnitSystem(unitSystem: number): void;
    /** Pa at an altitude in m (SI) */
    GetStandardAtmPressure(altitudeM: number): number;
    /** °C from dry bulb °C and relative humidity 0–1 */
    GetTDewPointFromRelHum(dryBulbC: number, relativeHumidity: number): number;
    /** kg water / kg dry air */
    GetHumRatioFromRelHum(dryBulbC: number, relativeHumidity: number, pressurePa: number): number;
    /** kg moist air / m³ */
    GetMoistAirDensity(dryBulbC: number, humidityRatio: number, pressurePa: number): number;
    /** kg/m³ of dry air at the given dry bulb and pressure */
    GetDryAirDensity(dryBulbC: number, pressurePa: number): number;
    /** Pa */
    GetSatVapPres(dryBulbC: number): number;
    /** wet bulb °C from dry bulb °C, dew point °C and pressure Pa */
    GetTWetBulbFromTDewPoint(dryBulbC: number, dewPointC: number, pressurePa: number): number;
  };
  export = psychrolib;
}

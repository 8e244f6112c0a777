import { BOUNDS, OUTDOOR_TEMPERATURE_LIMITS_C } from '../vocabulary';
import { EngineInputError, requireInRange } from '../errors';
import { type HouseSpec } from '../house.types';

export interface HeatingConditions {
  /** winter design dry bulb (e.g. the 99 % or 99.6 % value), °C */
  designOutdoorC: number;
  /** site elevation, m (sets air density through the standard atmosphere) */
  elevationM: number;
  /** inside relative humidity on the design night, % */
  insideRelativeHumidityPct: number;
  /** inside temperature to hold, °C; defaults to house.setpoints.nightHeatingC */
  insideC?: number;
  /**
   * Credit a drawn curtain in the design loss. Default false: heaters are sized for a night with
   * the curtain open, since curtains are opened to shed snow and can fail to close.
   */
  curtainClosed?: boolean;
  /** design wind speed, m/s; default the wind the U tables assume (reference-data/wind.json) */
  designWindSpeedMPerS?: number;
  /**
   * Size for a clear night: add the long-wave loss to a sky colder than the air through a covering
   * that passes thermal infrared (heating/sky-radiation.ts). Default false: the tabulated U-values'
   * conditions, with surroundings at the outdoor air temperature.
   */
  clearSky?: boolean;
  /** outdoor dew point on the design night, °C; default the clear-night depression below the air */
  outdoorDewPointC?: number;
}

/**
 * Checks the design-night conditions and returns the inside temperature to hold: the one entered,
 * or else the house's night heating setpoint.
 */
export function validateHeatingConditions(conditions: HeatingConditions, house: HouseSpec): number {
  if (!conditions || typeof conditions !== 'object') {
    throw new EngineInputError('conditions', 'conditions are required');
  }
  requireInRange(
    'conditions.designOutdoorC',
    conditions.designOutdoorC,
    BOUNDS.designOutdoorC.min,
    BOUNDS.designOutdoorC.max,
  );
  requireInRange('conditions.elevationM', conditions.elevationM, BOUNDS.elevationM.min, BOUNDS.elevationM.max);
  requireInRange(
    'conditions.insideRelativeHumidityPct',
    conditions.insideRelativeHumidityPct,
    BOUNDS.relativeHumidityPct.min,
    BOUNDS.relativeHumidityPct.max,
  );
  if (conditions.curtainClosed !== undefined && typeof conditions.curtainClosed !== 'boolean') {
    throw new EngineInputError('conditions.curtainClosed', 'conditions.curtainClosed must be true or false');
  }
  if (conditions.clearSky !== undefined && typeof conditions.clearSky !== 'boolean') {
    throw new EngineInputError('conditions.clearSky', 'conditions.clearSky must be true or false');
  }
  if (conditions.outdoorDewPointC !== undefined && conditions.outdoorDewPointC !== null) {
    requireInRange(
      'conditions.outdoorDewPointC',
      conditions.outdoorDewPointC,
      OUTDOOR_TEMPERATURE_LIMITS_C.min,
      conditions.designOutdoorC,
    );
  }
  if (conditions.insideC !== undefined && conditions.insideC !== null) {
    return requireInRange('conditions.insideC', conditions.insideC, BOUNDS.setpointC.min, BOUNDS.setpointC.max);
  }
  if (!house.setpoints || typeof house.setpoints !== 'object') {
    throw new EngineInputError('house.setpoints', 'house.setpoints are required');
  }
  return requireInRange(
    'house.setpoints.nightHeatingC',
    house.setpoints.nightHeatingC,
    BOUNDS.setpointC.min,
    BOUNDS.setpointC.max,
  );
}

import {
  clearSkyEmissivity,
  cloudCoverTenthsFromClearness,
  cloudFactor,
  skyDeficitWPerM2,
  type SkyConstants,
} from '../heating/sky-radiation';

/**
 * The night sky over each hour of a season, laid out once per climate (the house's part, how
 * strongly it is coupled to the sky, comes from heating/sky-radiation.ts `skyCoupling`):
 *   cloud cover of each day from its month's clearness K (Kasten & Czeplak, inverted),
 *   dew point of each night hour: the climate's monthly dew point where it gives one, else the
 *     day's minimum temperature less a depression (0 K: FAO-56), never above the hour's air,
 *   sky emissivity from the dew point (Berdahl & Martin) and the cloud factor (Clark & Allen),
 *   deficit = σ (T_air⁴ − T_sky⁴) in W/m², kept for every hour with a night share (0 in hours that
 *   lie wholly between sunrise and sunset: the season counts the sky loss at night only).
 */
export interface NightSkyInput {
  outdoorC: Float64Array;
  dayFraction: Float64Array;
  dailyMinC: Float64Array;
  clearnessOfDay: Float64Array;
  /** calendar month (1–12) of each day */
  monthOfDay: Uint8Array;
  /** the climate's dew point by month (index 0 = January); null where it gives none */
  dewPointCByMonth: ReadonlyArray<number | null> | null;
}

export interface NightSky {
  /** σ (T_air⁴ − T_sky⁴) per hour, W/m² */
  deficitWPerM2: Float64Array;
  /** opaque cloud cover of each day, tenths */
  cloudCoverTenthsOfDay: Float64Array;
}

export function nightSky(input: NightSkyInput, constants: SkyConstants): NightSky {
  const dayCount = input.dailyMinC.length;
  const deficitWPerM2 = new Float64Array(dayCount * 24);
  const cloudCoverTenthsOfDay = new Float64Array(dayCount);
  const depressionK = constants.nightDewPointBelowDailyMinimumK;
  const { outdoorC, dayFraction } = input;
  for (let day = 0; day < dayCount; day++) {
    const cloud = cloudCoverTenthsFromClearness(input.clearnessOfDay[day], constants);
    cloudCoverTenthsOfDay[day] = cloud;
    const factor = cloudFactor(cloud, constants);
    const fromClimate = input.dewPointCByMonth?.[input.monthOfDay[day] - 1];
    const dewPointC = typeof fromClimate === 'number' ? fromClimate : input.dailyMinC[day] - depressionK;
    // the same as skyEmissivityAt hour by hour, with the day's parts worked out once
    const clearAtDewPoint = clearSkyEmissivity(dewPointC, constants);
    for (let hour = day * 24; hour < day * 24 + 24; hour++) {
      if (dayFraction[hour] >= 1) continue;
      const airC = outdoorC[hour];
      const clear = airC < dewPointC ? clearSkyEmissivity(airC, constants) : clearAtDewPoint;
      const emissivity = Math.min(1, clear * factor);
      deficitWPerM2[hour] = skyDeficitWPerM2(airC, emissivity, constants);
    }
  }
  return { deficitWPerM2, cloudCoverTenthsOfDay };
}

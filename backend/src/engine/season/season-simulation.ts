/**
 * Hour-by-hour heating simulation over a date range.
 *
 * Per hour (local standard time, values at mid-hour):
 *   by day   (share f of the hour between sunrise and sunset):
 *            q_day   = max(0, UA_open · (T_day − T_out) − G),
 *            G = clear-sky global horizontal × clearness × roof transmittance × floor area × useful fraction
 *   by night (share 1 − f):
 *            q_night = max(0, UA_curtain · (T_night − T_out))
 *   heat = f · q_day + (1 − f) · q_night (W, average over the hour)
 * Unheated (empty) days contribute nothing. Heat stored in the structure, soil and crop is not
 * modelled: each hour balances on its own.
 *
 * Everything that does not change between variants of a house (temperatures, sun, month of each
 * day) is laid out once in `SeasonHours`; `simulateSeason` is then a tight loop over flat arrays.
 */

export interface MonthSlot {
  year: number;
  month: number;
}

/** The hours of a date range with their weather and sun, built once per site, climate and range. */
export interface SeasonHours {
  /** day number (days since 1970-01-01) of the first day */
  firstDayNumber: number;
  dayCount: number;
  hourCount: number;
  /** outdoor dry bulb per hour, °C */
  outdoorC: Float64Array;
  /** share of each hour between sunrise and sunset, 0–1 */
  dayFraction: Float64Array;
  /** clear-sky global horizontal irradiance per hour, W/m² */
  clearSkyGlobalHorizontalWPerM2: Float64Array;
  /** sky clearness of each day (its month's value), 0–1 */
  clearnessOfDay: Float64Array;
  /** index into `months` of each day */
  monthSlotOfDay: Uint8Array;
  months: MonthSlot[];
  /** daily minimum and maximum outdoor temperature per day, °C (for degree-days) */
  dailyMinC: Float64Array;
  dailyMaxC: Float64Array;
}

/** What a variant of the house brings to the loop. */
export interface SimulationParameters {
  /** heat-loss coefficient by day (curtain open), W/K */
  uaDayWPerK: number;
  /** heat-loss coefficient by night (curtain drawn if the house has one), W/K */
  uaNightWPerK: number;
  /** W of useful solar gain per W/m² of horizontal irradiance (transmittance × floor area × useful fraction), m² */
  solarGainAreaM2: number;
  /** per day; NaN on unheated days, °C */
  daySetpointC: Float64Array;
  nightSetpointC: Float64Array;
}

export interface SimulationResult {
  /** heat delivered per month slot, Wh */
  monthlyHeatWh: Float64Array;
  monthlyHeatingHours: Uint32Array;
  monthlyPeakW: Float64Array;
  totalHeatWh: number;
  /** heat delivered in the night share of hours, Wh */
  nightHeatWh: number;
  /** heat the sun supplied that the heater would otherwise have had to, Wh */
  solarOffsetWh: number;
  heatingHours: number;
  peakW: number;
  /** hour index (from the first hour of the range) of the peak, −1 if no heat was needed */
  peakHourIndex: number;
}

export function simulateSeason(hours: SeasonHours, parameters: SimulationParameters): SimulationResult {
  const monthCount = hours.months.length;
  const monthlyHeatWh = new Float64Array(monthCount);
  const monthlyHeatingHours = new Uint32Array(monthCount);
  const monthlyPeakW = new Float64Array(monthCount);
  const outdoorC = hours.outdoorC;
  const dayFraction = hours.dayFraction;
  const irradiance = hours.clearSkyGlobalHorizontalWPerM2;
  const { uaDayWPerK, uaNightWPerK, solarGainAreaM2, daySetpointC, nightSetpointC } = parameters;

  let totalHeatWh = 0;
  let nightHeatWh = 0;
  let solarOffsetWh = 0;
  let heatingHours = 0;
  let peakW = 0;
  let peakHourIndex = -1;

  for (let day = 0; day < hours.dayCount; day++) {
    const dayC = daySetpointC[day];
    if (dayC !== dayC) continue; // NaN: unheated day
    const nightC = nightSetpointC[day];
    const gainPerIrradiance = solarGainAreaM2 * hours.clearnessOfDay[day];
    const slot = hours.monthSlotOfDay[day];
    let monthWh = 0;
    let monthHours = 0;
    let monthPeak = monthlyPeakW[slot];
    const firstHour = day * 24;
    const lastHour = firstHour + 24;
    for (let hour = firstHour; hour < lastHour; hour++) {
      const tOut = outdoorC[hour];
      const share = dayFraction[hour];
      let heatW = 0;
      if (share > 0) {
        const lossW = uaDayWPerK * (dayC - tOut);
        if (lossW > 0) {
          const gainW = gainPerIrradiance * irradiance[hour];
          if (lossW > gainW) {
            heatW = share * (lossW - gainW);
            solarOffsetWh += share * gainW;
          } else {
            solarOffsetWh += share * lossW;
          }
        }
      }
      if (share < 1) {
        const lossW = uaNightWPerK * (nightC - tOut);
        if (lossW > 0) {
          const nightW = (1 - share) * lossW;
          heatW += nightW;
          nightHeatWh += nightW;
        }
      }
      if (heatW > 0) {
        monthWh += heatW;
        monthHours++;
        if (heatW > monthPeak) monthPeak = heatW;
        if (heatW > peakW) {
          peakW = heatW;
          peakHourIndex = hour;
        }
      }
    }
    monthlyHeatWh[slot] += monthWh;
    monthlyHeatingHours[slot] += monthHours;
    monthlyPeakW[slot] = monthPeak;
    totalHeatWh += monthWh;
    heatingHours += monthHours;
  }

  return {
    monthlyHeatWh,
    monthlyHeatingHours,
    monthlyPeakW,
    totalHeatWh,
    nightHeatWh,
    solarOffsetWh,
    heatingHours,
    peakW,
    peakHourIndex,
  };
}

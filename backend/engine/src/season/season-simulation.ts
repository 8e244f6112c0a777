/**
 * Hour-by-hour heating simulation over a date range.
 *
 * Per hour (local standard time, values at mid-hour):
 *   by day   (share f of the hour between sunrise and sunset):
 *            q_day   = max(0, UA_open · (T_day − T_out) − G),
 *            G = clear-sky global horizontal × clearness × roof transmittance × shade × floor area × useful fraction
 *            (shade: the share a shade cloth passes in the months it is in place, 1 in the others)
 *   by night (share 1 − f):
 *            q_night = max(0, UA_curtain · (T_night − T_out) + S_night · D),
 *            D the sky deficit σ (T_out⁴ − T_sky⁴) of the hour (season-sky.ts) and S_night the house's
 *            coupling to it, m² (heating/sky-radiation.ts skyCoupling: crop through the roof, curtain
 *            drawn if the house has one, and the coverings' outer surfaces)
 *   heat = f · q_day + (1 − f) · q_night (W, average over the hour)
 * Lamps (when the house has them) add their heat P_lamp in the share of each part of the hour they
 * run (season-lamps.ts): there q_lit = max(0, q − P_lamp), never below zero; lamp heat beyond the
 * hour's loss is vented, not stored. What the lamps save is the heat the heaters then do not
 * deliver: Σ lit share × (min(q, P) − min(q_lit, P)).
 * The heaters deliver at most their installed output P: each part of the hour gets min(q, P);
 * what they cannot deliver is unmet heat (the house falls below its setpoint), and an hour in
 * which either part needs more than P counts as an hour below the setpoint. Fuel follows the
 * delivered heat. P = Infinity leaves the demand uncapped.
 * Unheated (empty) days contribute nothing. Heat stored in the structure, soil and crop is not
 * modelled: each hour balances on its own.
 * For the breakdown of the season's heat by part the loop also sums, over the hours in which each
 * part of the hour loses heat, the degree-hours by day Σ f·(T_day − T_out) and by night
 * Σ (1 − f)·(T_night − T_out) and the sky's share Σ (1 − f)·S_night·D, so that
 *   delivered = UA_open·(day degree-hours) + UA_curtain·(night degree-hours) + sky − solar offset − unmet.
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
  /**
   * sunrise and sunset of each day and its two neighbours, hours after that day's local midnight
   * (index k + 1 for day k, k = −1 … dayCount; sunset may pass 24)
   */
  sunriseHourOfDay: Float64Array;
  sunsetHourOfDay: Float64Array;
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
  /** σ (T_out⁴ − T_sky⁴) per hour with a night share, W/m² (0 in hours wholly by day) */
  skyDeficitWPerM2: Float64Array;
  /** opaque cloud cover of each day, tenths */
  cloudCoverTenthsOfDay: Float64Array;
}

/** What a variant of the house brings to the loop. */
export interface SimulationParameters {
  /** heat-loss coefficient by day (curtain open), W/K */
  uaDayWPerK: number;
  /** heat-loss coefficient by night (curtain drawn if the house has one), W/K */
  uaNightWPerK: number;
  /** by night: W lost to the sky per W/m² of sky deficit (heating/sky-radiation.ts skyCoupling), m² */
  skyNightM2: number;
  /** W of useful solar gain per W/m² of horizontal irradiance (transmittance × floor area × useful fraction), m² */
  solarGainAreaM2: number;
  /**
   * share of the sun a shade cloth passes, by calendar month (index 0 = January); 1 where no cloth
   * is in place. Absent: no shade in any month.
   */
  solarShadeByMonth?: ArrayLike<number>;
  /** per day; NaN on unheated days, °C */
  daySetpointC: Float64Array;
  nightSetpointC: Float64Array;
  /** installed heater output, W; Infinity = uncapped (deliver whatever the house needs) */
  heaterOutputW: number;
  /** the lamps' heat and when they run; null or absent without lamps */
  lamps?: SimulationLamps | null;
}

export interface SimulationLamps {
  /** heat the lamps give the house while they run, W */
  heatW: number;
  /** per hour, share of the hour they run while the sun is up / down */
  onWhileSunUp: Float64Array;
  onWhileSunDown: Float64Array;
}

export interface SimulationResult {
  /** heat delivered per month slot, Wh */
  monthlyHeatWh: Float64Array;
  monthlyHeatingHours: Uint32Array;
  /** highest hourly-average heat demand per month slot (before any heater limit), W */
  monthlyPeakW: Float64Array;
  /** heat the heaters could not deliver per month slot, Wh */
  monthlyUnmetHeatWh: Float64Array;
  /** hours in which the heaters could not hold the setpoint, per month slot */
  monthlyHoursBelowSetpoint: Uint32Array;
  /** heat delivered, Wh */
  totalHeatWh: number;
  /** heat needed but not delivered (heaters too small), Wh */
  unmetHeatWh: number;
  hoursBelowSetpoint: number;
  /** heat delivered in the night share of hours, Wh */
  nightHeatWh: number;
  /** Σ f·(T_day − T_out) over the day shares of heated hours that lose heat, K·h */
  dayDegreeHoursKh: number;
  /** Σ (1 − f)·(T_night − T_out) over the night shares of heated hours that lose heat, K·h */
  nightDegreeHoursKh: number;
  /** heat lost to the night sky in those night shares, Wh (part of the demand) */
  skyWh: number;
  /** heat the sun supplied that the heater would otherwise have had to, Wh */
  solarOffsetWh: number;
  /** heat the heaters did not deliver because the lamps gave it, Wh (0 without lamps) */
  lampSavedHeatWh: number;
  /** the same per month slot, Wh */
  monthlyLampSavedHeatWh: Float64Array;
  heatingHours: number;
  /** highest hourly-average heat demand (before any heater limit), W */
  peakW: number;
  /** hour index (from the first hour of the range) of the peak, −1 if no heat was needed */
  peakHourIndex: number;
}

export function simulateSeason(hours: SeasonHours, parameters: SimulationParameters): SimulationResult {
  const monthCount = hours.months.length;
  const monthlyHeatWh = new Float64Array(monthCount);
  const monthlyHeatingHours = new Uint32Array(monthCount);
  const monthlyPeakW = new Float64Array(monthCount);
  const monthlyUnmetHeatWh = new Float64Array(monthCount);
  const monthlyHoursBelowSetpoint = new Uint32Array(monthCount);
  const monthlyLampSavedHeatWh = new Float64Array(monthCount);
  const outdoorC = hours.outdoorC;
  const dayFraction = hours.dayFraction;
  const irradiance = hours.clearSkyGlobalHorizontalWPerM2;
  const skyDeficit = hours.skyDeficitWPerM2;
  const { uaDayWPerK, uaNightWPerK, skyNightM2, solarGainAreaM2, daySetpointC, nightSetpointC } = parameters;
  const capW = Number.isNaN(parameters.heaterOutputW) ? Infinity : Math.max(0, parameters.heaterOutputW);
  // the shade of each month slot, looked up once (a cloth never adds sun: clamped to [0, 1])
  const shadeOfSlot = hours.months.map(({ month }) => {
    const shade = parameters.solarShadeByMonth?.[month - 1] ?? 1;
    return Math.min(1, Math.max(0, shade));
  });
  const lamps = parameters.lamps && parameters.lamps.heatW > 0 ? parameters.lamps : null;
  const lampW = lamps ? lamps.heatW : 0;

  let totalHeatWh = 0;
  let unmetHeatWh = 0;
  let hoursBelowSetpoint = 0;
  let nightHeatWh = 0;
  let dayDegreeHoursKh = 0;
  let nightDegreeHoursKh = 0;
  let skyWh = 0;
  let solarOffsetWh = 0;
  let lampSavedHeatWh = 0;
  let heatingHours = 0;
  let peakW = 0;
  let peakHourIndex = -1;

  for (let day = 0; day < hours.dayCount; day++) {
    const dayC = daySetpointC[day];
    if (dayC !== dayC) continue; // NaN: unheated day
    const nightC = nightSetpointC[day];
    const slot = hours.monthSlotOfDay[day];
    const gainPerIrradiance = solarGainAreaM2 * hours.clearnessOfDay[day] * shadeOfSlot[slot];
    let monthWh = 0;
    let monthUnmetWh = 0;
    let monthHoursBelow = 0;
    let monthHours = 0;
    let monthLampSavedWh = 0;
    let monthPeak = monthlyPeakW[slot];
    const firstHour = day * 24;
    const lastHour = firstHour + 24;
    for (let hour = firstHour; hour < lastHour; hour++) {
      const tOut = outdoorC[hour];
      const share = dayFraction[hour];
      // demand (what holding the setpoint takes) and delivered (at most the heaters' output)
      let demandW = 0;
      let deliveredW = 0;
      let short = false;
      if (share > 0) {
        const lossW = uaDayWPerK * (dayC - tOut);
        if (lossW > 0) {
          dayDegreeHoursKh += share * (dayC - tOut);
          const gainW = gainPerIrradiance * irradiance[hour];
          if (lossW > gainW) {
            const needW = lossW - gainW;
            // the lit part of the day share needs what the lamps leave
            const lit = lamps ? lamps.onWhileSunUp[hour] : 0;
            const dark = share - lit;
            demandW += dark * needW;
            if (needW > capW) {
              deliveredW += dark * capW;
              if (dark > 0) short = true;
            } else {
              deliveredW += dark * needW;
            }
            if (lit > 0) {
              const litNeedW = needW > lampW ? needW - lampW : 0;
              const litDeliveredW = litNeedW > capW ? capW : litNeedW;
              if (litNeedW > capW) short = true;
              demandW += lit * litNeedW;
              deliveredW += lit * litDeliveredW;
              monthLampSavedWh += lit * ((needW > capW ? capW : needW) - litDeliveredW);
            }
            solarOffsetWh += share * gainW;
          } else {
            solarOffsetWh += share * lossW;
          }
        }
      }
      if (share < 1) {
        const skyW = skyNightM2 * skyDeficit[hour];
        const lossW = uaNightWPerK * (nightC - tOut) + skyW;
        if (lossW > 0) {
          nightDegreeHoursKh += (1 - share) * (nightC - tOut);
          skyWh += (1 - share) * skyW;
          const lit = lamps ? lamps.onWhileSunDown[hour] : 0;
          const dark = 1 - share - lit;
          let nightDemandW = dark * lossW;
          let nightW = nightDemandW;
          if (lossW > capW) {
            nightW = dark * capW;
            if (dark > 0) short = true;
          }
          if (lit > 0) {
            const litNeedW = lossW > lampW ? lossW - lampW : 0;
            const litDeliveredW = litNeedW > capW ? capW : litNeedW;
            if (litNeedW > capW) short = true;
            nightDemandW += lit * litNeedW;
            nightW += lit * litDeliveredW;
            monthLampSavedWh += lit * ((lossW > capW ? capW : lossW) - litDeliveredW);
          }
          demandW += nightDemandW;
          deliveredW += nightW;
          nightHeatWh += nightW;
        }
      }
      if (demandW > 0) {
        monthWh += deliveredW;
        monthHours++;
        if (short) {
          monthUnmetWh += demandW - deliveredW;
          monthHoursBelow++;
        }
        if (demandW > monthPeak) monthPeak = demandW;
        if (demandW > peakW) {
          peakW = demandW;
          peakHourIndex = hour;
        }
      }
    }
    monthlyHeatWh[slot] += monthWh;
    monthlyHeatingHours[slot] += monthHours;
    monthlyPeakW[slot] = monthPeak;
    monthlyUnmetHeatWh[slot] += monthUnmetWh;
    monthlyHoursBelowSetpoint[slot] += monthHoursBelow;
    monthlyLampSavedHeatWh[slot] += monthLampSavedWh;
    totalHeatWh += monthWh;
    unmetHeatWh += monthUnmetWh;
    hoursBelowSetpoint += monthHoursBelow;
    heatingHours += monthHours;
    lampSavedHeatWh += monthLampSavedWh;
  }

  return {
    monthlyHeatWh,
    monthlyHeatingHours,
    monthlyPeakW,
    monthlyUnmetHeatWh,
    monthlyHoursBelowSetpoint,
    totalHeatWh,
    unmetHeatWh,
    hoursBelowSetpoint,
    nightHeatWh,
    dayDegreeHoursKh,
    nightDegreeHoursKh,
    skyWh,
    solarOffsetWh,
    lampSavedHeatWh,
    monthlyLampSavedHeatWh,
    heatingHours,
    peakW,
    peakHourIndex,
  };
}

import type { Lamps } from '../house.types';
import { lampPower, lampsInUse, overlapLength, type LampPower } from '../lamps/lamps';
import type { SeasonHours } from './season-simulation';

/**
 * When a house's lamps run over a season, hour by hour (reference-data/lamps.json
 * 'schedule-block-ending-at-sunrise'): on each heated day d one block [sunrise_d − H, sunrise_d],
 * H the hours of d's month. Each hour's share of lamp time is split into the part while the sun
 * is up (a block longer than the night reaches back past the previous sunset) and the part while
 * it is down, because the two parts of an hour balance against different setpoints and curtains.
 * An hour is never lit more than once over (two blocks cannot add past a whole hour).
 */
export interface SeasonLampSchedule extends LampPower {
  /** per hour, share of the hour the lamps run while the sun is up, 0 … dayFraction */
  onWhileSunUp: Float64Array;
  /** per hour, share of the hour the lamps run while the sun is down, 0 … 1 − dayFraction */
  onWhileSunDown: Float64Array;
  /** electrical energy per month slot, Wh */
  monthlyElectricWh: Float64Array;
  /** heat into the house per month slot (electricity × heat share), Wh */
  monthlyHeatWh: Float64Array;
  electricWh: number;
  heatWh: number;
}

/** Daylight within [from, to] (hours from the range's first midnight), from the days around it. */
function daylightWithin(hours: SeasonHours, from: number, to: number): number {
  const firstDay = Math.floor(from / 24) - 1;
  const lastDay = Math.floor(to / 24) + 1;
  let daylight = 0;
  for (let day = Math.max(-1, firstDay); day <= Math.min(hours.dayCount, lastDay); day++) {
    const sunrise = day * 24 + hours.sunriseHourOfDay[day + 1];
    const sunset = day * 24 + hours.sunsetHourOfDay[day + 1];
    daylight += overlapLength(from, to, sunrise, sunset);
  }
  return Math.min(daylight, to - from);
}

/**
 * The lamps' hours over the season; null without lamps (or with lamps that never run).
 * `heatedDay(d)` says whether day d is planted and heated: lamps run only then.
 */
export function seasonLampSchedule(
  hours: SeasonHours,
  lamps: Lamps | null | undefined,
  floorAreaM2: number,
  heatedDay: (day: number) => boolean,
): SeasonLampSchedule | null {
  if (!lampsInUse(lamps)) return null;
  const power = lampPower(lamps, floorAreaM2);
  const onWhileSunUp = new Float64Array(hours.hourCount);
  const onWhileSunDown = new Float64Array(hours.hourCount);
  for (let day = 0; day < hours.dayCount; day++) {
    if (!heatedDay(day)) continue;
    const month = hours.months[hours.monthSlotOfDay[day]].month;
    const hoursOn = lamps.hoursPerDayByMonth[month - 1];
    if (!(hoursOn > 0)) continue;
    const end = day * 24 + hours.sunriseHourOfDay[day + 1];
    const start = end - hoursOn;
    for (let hour = Math.max(0, Math.floor(start)); hour < Math.min(hours.hourCount, Math.ceil(end)); hour++) {
      const from = Math.max(hour, start);
      const to = Math.min(hour + 1, end);
      if (to <= from) continue;
      const sunUp = daylightWithin(hours, from, to);
      onWhileSunUp[hour] += sunUp;
      onWhileSunDown[hour] += to - from - sunUp;
    }
  }
  const monthlyElectricWh = new Float64Array(hours.months.length);
  let electricWh = 0;
  for (let hour = 0; hour < hours.hourCount; hour++) {
    const share = hours.dayFraction[hour];
    onWhileSunUp[hour] = Math.min(onWhileSunUp[hour], share);
    onWhileSunDown[hour] = Math.min(onWhileSunDown[hour], 1 - share);
    const wh = (onWhileSunUp[hour] + onWhileSunDown[hour]) * power.electricW;
    if (wh > 0) {
      monthlyElectricWh[hours.monthSlotOfDay[Math.floor(hour / 24)]] += wh;
      electricWh += wh;
    }
  }
  const heatShare = power.heatW / power.electricW;
  return {
    ...power,
    onWhileSunUp,
    onWhileSunDown,
    monthlyElectricWh,
    monthlyHeatWh: monthlyElectricWh.map((wh) => wh * heatShare),
    electricWh,
    heatWh: electricWh * heatShare,
  };
}

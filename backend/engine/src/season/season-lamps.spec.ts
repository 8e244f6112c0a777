import type { Lamps } from '../house.types';
import { seasonLampSchedule } from './season-lamps';
import { simulateSeason, type SeasonHours, type SimulationParameters } from './season-simulation';

/**
 * Two hand-made January days: −15 °C every hour, no sun in the sky, daylight 08:00–16:00 each day
 * (sunrise 8, sunset 16), so the night before day 1 runs from 16:00 of day 0 to 08:00 of day 1.
 */
function twoDays(): SeasonHours {
  const dayFraction = new Float64Array(48);
  for (const first of [0, 24]) for (let hour = first + 8; hour < first + 16; hour++) dayFraction[hour] = 1;
  return {
    firstDayNumber: 0,
    dayCount: 2,
    hourCount: 48,
    outdoorC: new Float64Array(48).fill(-15),
    dayFraction,
    sunriseHourOfDay: new Float64Array([8, 8, 8, 8]),
    sunsetHourOfDay: new Float64Array([16, 16, 16, 16]),
    clearSkyGlobalHorizontalWPerM2: new Float64Array(48),
    // an overcast sky as warm as the air: no long-wave loss to the night sky
    skyDeficitWPerM2: new Float64Array(48),
    cloudCoverTenthsOfDay: new Float64Array([10, 10]),
    clearnessOfDay: new Float64Array([0, 0]),
    monthSlotOfDay: new Uint8Array([0, 0]),
    months: [{ year: 1970, month: 1 }],
    dailyMinC: new Float64Array([-15, -15]),
    dailyMaxC: new Float64Array([-15, -15]),
  };
}

function lampsOf(hoursInJanuary: number, overrides: Partial<Lamps> = {}): Lamps {
  return {
    powerDensityWPerM2: 100,
    hoursPerDayByMonth: [hoursInJanuary, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0],
    heatToHouseFraction: 1,
    ...overrides,
  };
}

const FLOOR_M2 = 1000;
/** day 0 unheated, day 1 heated: only day 1's block (ending at its sunrise) runs */
const onlyDayOne = (day: number) => day === 1;

function parameters(overrides: Partial<SimulationParameters> = {}): SimulationParameters {
  return {
    // 5000 W/K × (15 − (−15)) K = 150 kW of loss in every hour, day (curtain open) or night
    uaDayWPerK: 5000,
    uaNightWPerK: 5000,
    skyNightM2: 0,
    solarGainAreaM2: 0,
    daySetpointC: new Float64Array([NaN, 15]),
    nightSetpointC: new Float64Array([NaN, 15]),
    heaterOutputW: Infinity,
    ...overrides,
  };
}

describe('lamps over a season: when they run and what they use', () => {
  it('100 W/m² over 1000 m² for 10 h is 1000 kWh of electricity, and all of it heat at a share of 1', () => {
    const schedule = seasonLampSchedule(twoDays(), lampsOf(10), FLOOR_M2, onlyDayOne)!;
    // by hand: 100 W/m² × 1000 m² = 100 kW; × 10 h = 1000 kWh = 1,000,000 Wh
    expect(schedule.electricW).toBe(100_000);
    expect(schedule.electricWh).toBeCloseTo(1_000_000, 6);
    expect(schedule.heatWh).toBeCloseTo(1_000_000, 6);
    expect(schedule.monthlyElectricWh[0]).toBeCloseTo(1_000_000, 6);
    // the block ends at day 1's sunrise (hour 24 + 8 = 32) and starts 10 h before, at hour 22 of day 0
    const lit = Array.from(schedule.onWhileSunDown, (share, hour) => (share > 0 ? hour : -1)).filter((h) => h >= 0);
    expect(lit).toEqual([22, 23, 24, 25, 26, 27, 28, 29, 30, 31]);
    // all of it after sunset of day 0 (16:00) and before sunrise: none while the sun is up
    expect(schedule.onWhileSunUp.every((share) => share === 0)).toBe(true);
  });

  it('a heat share of 0.95 gives 950 kWh of heat for the same 1000 kWh of electricity', () => {
    const schedule = seasonLampSchedule(twoDays(), lampsOf(10, { heatToHouseFraction: 0.95 }), FLOOR_M2, onlyDayOne)!;
    expect(schedule.heatW).toBeCloseTo(95_000, 9);
    expect(schedule.heatWh).toBeCloseTo(950_000, 6);
  });

  it('a block longer than the night reaches back past sunset into daylight', () => {
    // 20 h ending at 32 starts at 12 (day 0, 12:00): 12–16 in daylight (4 h), 16–32 at night (16 h)
    const schedule = seasonLampSchedule(twoDays(), lampsOf(20), FLOOR_M2, onlyDayOne)!;
    const sunUp = schedule.onWhileSunUp.reduce((a, b) => a + b, 0);
    const sunDown = schedule.onWhileSunDown.reduce((a, b) => a + b, 0);
    expect(sunUp).toBeCloseTo(4, 12);
    expect(sunDown).toBeCloseTo(16, 12);
    expect(schedule.onWhileSunUp[12]).toBe(1);
    expect(schedule.onWhileSunUp[16]).toBe(0);
  });

  it('lamps off in a month with 0 hours, on unheated days, and no lamps at all: nothing', () => {
    expect(seasonLampSchedule(twoDays(), null, FLOOR_M2, onlyDayOne)).toBeNull();
    expect(seasonLampSchedule(twoDays(), lampsOf(0), FLOOR_M2, onlyDayOne)).toBeNull();
    const noneHeated = seasonLampSchedule(twoDays(), lampsOf(10), FLOOR_M2, () => false)!;
    expect(noneHeated.electricWh).toBe(0);
  });
});

describe('lamps in the hourly heat balance', () => {
  it('100 kW of lamp heat takes a 150 kW night hour down to 50 kW; 10 lit hours save 1000 kWh', () => {
    const hours = twoDays();
    const lamps = seasonLampSchedule(hours, lampsOf(10), FLOOR_M2, onlyDayOne)!;
    const without = simulateSeason(hours, parameters());
    const withLamps = simulateSeason(hours, parameters({ lamps }));
    // by hand, day 1 only: 24 h × 150 kW = 3600 kWh without lamps
    expect(without.totalHeatWh).toBeCloseTo(3_600_000, 6);
    // the 8 lit hours of day 1 (00:00–08:00) need 150 − 100 = 50 kW; hours 22–23 of day 0 are
    // unheated: 16 h × 150 + 8 h × 50 = 2800 kWh, so the heat saved is 8 h × 100 kW = 800 kWh
    expect(withLamps.totalHeatWh).toBeCloseTo(2_800_000, 6);
    expect(withLamps.lampSavedHeatWh).toBeCloseTo(800_000, 6);
    expect(withLamps.monthlyLampSavedHeatWh[0]).toBeCloseTo(800_000, 6);
  });

  it('all ten lit hours count when both days are heated: 10 h × 100 kW = 1000 kWh saved', () => {
    const hours = twoDays();
    const lamps = seasonLampSchedule(hours, lampsOf(10), FLOOR_M2, onlyDayOne)!;
    const bothDays = parameters({
      daySetpointC: new Float64Array([15, 15]),
      nightSetpointC: new Float64Array([15, 15]),
    });
    const without = simulateSeason(hours, bothDays);
    const withLamps = simulateSeason(hours, { ...bothDays, lamps });
    // by hand: 48 h × 150 kW = 7200 kWh; 10 lit hours at 50 kW instead of 150 kW
    expect(without.totalHeatWh).toBeCloseTo(7_200_000, 6);
    expect(withLamps.totalHeatWh).toBeCloseTo(7_200_000 - 1_000_000, 6);
    expect(withLamps.lampSavedHeatWh).toBeCloseTo(1_000_000, 6);
  });

  it('never below zero demand: 200 kW of lamps in a 150 kW hour leave 0, and save only the 150 kW', () => {
    const hours = twoDays();
    const lamps = seasonLampSchedule(hours, lampsOf(10, { powerDensityWPerM2: 200 }), FLOOR_M2, onlyDayOne)!;
    const withLamps = simulateSeason(hours, parameters({ lamps }));
    // 16 unlit hours × 150 kW; 8 lit hours need nothing (not −50 kW)
    expect(withLamps.totalHeatWh).toBeCloseTo(16 * 150_000, 6);
    expect(withLamps.lampSavedHeatWh).toBeCloseTo(8 * 150_000, 6);
    // a lit hour that needs nothing is not a heating hour
    expect(withLamps.heatingHours).toBe(16);
  });

  it('with heaters of 120 kW the saving is what the heaters no longer deliver: 120 − 50 = 70 kW per lit hour', () => {
    const hours = twoDays();
    const lamps = seasonLampSchedule(hours, lampsOf(10), FLOOR_M2, onlyDayOne)!;
    const capped = parameters({ heaterOutputW: 120_000 });
    const without = simulateSeason(hours, capped);
    const withLamps = simulateSeason(hours, { ...capped, lamps });
    // without lamps every hour is short (150 > 120): 24 h × 120 kW delivered
    expect(without.totalHeatWh).toBeCloseTo(24 * 120_000, 6);
    expect(without.hoursBelowSetpoint).toBe(24);
    // with lamps the 8 lit hours need 50 kW, which the heaters hold
    expect(withLamps.totalHeatWh).toBeCloseTo(16 * 120_000 + 8 * 50_000, 6);
    expect(withLamps.hoursBelowSetpoint).toBe(16);
    expect(withLamps.lampSavedHeatWh).toBeCloseTo(8 * 70_000, 6);
    expect(without.totalHeatWh - withLamps.totalHeatWh).toBeCloseTo(withLamps.lampSavedHeatWh, 6);
  });

  it('lamp time while the sun is up offsets the day setpoint’s loss', () => {
    const hours = twoDays();
    // 20 h block: 4 h while the sun is up on day 0 (unheated) — heat both days to see them
    const lamps = seasonLampSchedule(hours, lampsOf(20), FLOOR_M2, onlyDayOne)!;
    const bothDays = parameters({
      daySetpointC: new Float64Array([20, 20]),
      nightSetpointC: new Float64Array([15, 15]),
    });
    const withLamps = simulateSeason(hours, { ...bothDays, lamps });
    // by hand: day hours lose 5000 × 35 = 175 kW, night hours 150 kW; lamps give 100 kW
    // lit by day: 4 h × 100 kW; lit by night: 16 h × 100 kW → 2000 kWh saved
    expect(withLamps.lampSavedHeatWh).toBeCloseTo(20 * 100_000, 6);
  });
});

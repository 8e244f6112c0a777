import { simulateSeason, type SeasonHours, type SimulationParameters } from './season-simulation';

/** One day of hand-made hours: 0 °C all day, daylight 08:00–16:00 with a half-daylight hour at 07:00. */
function oneDay(irradianceWPerM2: number): SeasonHours {
  const dayFraction = new Float64Array(24);
  const irradiance = new Float64Array(24);
  for (let hour = 8; hour < 16; hour++) {
    dayFraction[hour] = 1;
    irradiance[hour] = irradianceWPerM2;
  }
  dayFraction[7] = 0.5;
  return {
    firstDayNumber: 0,
    dayCount: 1,
    hourCount: 24,
    outdoorC: new Float64Array(24).fill(0),
    dayFraction,
    clearSkyGlobalHorizontalWPerM2: irradiance,
    clearnessOfDay: new Float64Array([0.5]),
    monthSlotOfDay: new Uint8Array([0]),
    months: [{ year: 1970, month: 1 }],
    dailyMinC: new Float64Array([0]),
    dailyMaxC: new Float64Array([0]),
  };
}

function parameters(overrides: Partial<SimulationParameters> = {}): SimulationParameters {
  return {
    uaDayWPerK: 100,
    uaNightWPerK: 60,
    solarGainAreaM2: 0,
    daySetpointC: new Float64Array([20]),
    nightSetpointC: new Float64Array([10]),
    ...overrides,
  };
}

describe('hourly season simulation', () => {
  it('switches setpoint and curtain UA at sunrise and sunset, splitting the sunrise hour', () => {
    const result = simulateSeason(oneDay(0), parameters());
    // 8.5 day hours at 100 W/K × 20 K, 15.5 night hours at 60 W/K × 10 K
    expect(result.totalHeatWh).toBeCloseTo(8.5 * 2000 + 15.5 * 600, 9);
    expect(result.nightHeatWh).toBeCloseTo(15.5 * 600, 9);
    expect(result.peakW).toBe(2000);
    expect(result.peakHourIndex).toBe(8);
    expect(result.heatingHours).toBe(24);
  });

  it('lets sunlight offset daytime loss but never turns it into negative heat', () => {
    // gain = 1000 W/m² × clearness 0.5 × 5 m² = 2500 W > 2000 W loss
    const result = simulateSeason(oneDay(1000), parameters({ solarGainAreaM2: 5 }));
    expect(result.totalHeatWh).toBeCloseTo(0.5 * 2000 + 15.5 * 600, 9);
    expect(result.solarOffsetWh).toBeCloseTo(8 * 2000, 9);
    expect(result.heatingHours).toBe(16);
  });

  it('skips unheated days', () => {
    const result = simulateSeason(oneDay(0), parameters({ daySetpointC: new Float64Array([NaN]), nightSetpointC: new Float64Array([NaN]) }));
    expect(result.totalHeatWh).toBe(0);
    expect(result.peakHourIndex).toBe(-1);
  });
});

import { estimateSeason } from '../estimate-season';
import { EngineInputError } from '../errors';
import { demoSeasonInput } from '../season/demo-season';
import { SunCache } from '../season/sun-hours';
import { loadReferenceData } from '../testing/reference-data';
import { calibrateHeatLoss, type CalibrationInput, type CalibrationPeriodInput } from './calibrate';
import { fuelQuantityToKWh } from './fuel-units';
import { fuelRow } from '../season/fuel';

const ref = loadReferenceData();
const sun = new SunCache();
const demo = demoSeasonInput();

const MONTHS: Array<[string, string]> = [
  ['2025-10-01', '2025-10-31'],
  ['2025-11-01', '2025-11-30'],
  ['2025-12-01', '2025-12-31'],
  ['2026-01-01', '2026-01-31'],
  ['2026-02-01', '2026-02-28'],
  ['2026-03-01', '2026-03-31'],
  ['2026-04-01', '2026-04-30'],
];
// Deterministic ±3 % noise (invented for the test), alternating so no bill is exact.
const NOISE = [1.03, 0.97, 1.03, 0.97, 1.03, 0.97, 1.03];

/** Fuel the engine itself says the demo house burns over a period with its heat loss × factor, kWh. */
function engineFuelKWh(startDate: string, endDate: string, factor: number): number {
  const estimate = estimateSeason({ ...demo, season: { startDate, endDate }, heatLossFactor: factor }, ref, sun);
  return estimate.total.fuelInputKWh;
}

function period(index: number, billedFuelKWh: number, overrides: Partial<CalibrationPeriodInput> = {}) {
  const [startDate, endDate] = MONTHS[index];
  return {
    id: String(index + 1),
    startDate,
    endDate,
    fuelId: 'propane',
    houseIds: ['1'],
    billedFuelKWh,
    nonHeatingFuelKWhPerDay: 0,
    climate: demo.climate,
    climateFrom: 'normals' as const,
    ...overrides,
  };
}

function input(periods: CalibrationPeriodInput[]): CalibrationInput {
  return {
    site: demo.site,
    houses: [{ id: '1', name: 'House 1', house: demo.house, calendar: null }],
    periods,
  };
}

describe('calibration against fuel bills', () => {
  it('fits bills the engine made with the heat loss × 1.25 and ±3 % noise back to 1.25 ± 0.05', () => {
    const bills = MONTHS.map(([start, end], index) => period(index, engineFuelKWh(start, end, 1.25) * NOISE[index]));
    const result = calibrateHeatLoss(input(bills), ref, sun);
    expect(result.meters).toHaveLength(1);
    const meter = result.meters[0];
    expect(meter.fitted).toBe(true);
    expect(meter.factor).toBeGreaterThan(1.2);
    expect(meter.factor).toBeLessThan(1.3);
    // the 90 % interval holds the true factor and is narrow for 7 bills with 3 % noise
    expect(meter.factorLow90!).toBeLessThan(1.25);
    expect(meter.factorHigh90!).toBeGreaterThan(1.25);
    expect(meter.factorHigh90! - meter.factorLow90!).toBeLessThan(0.1);
    expect(meter.degreesOfFreedom).toBe(6);
    expect(meter.meetsGuideline14).toBe(true);
    expect(meter.meaning).toMatch(/about 25 % more heat loss/i);
    expect(result.houses).toEqual([{ houseId: '1', name: 'House 1', factor: meter.factor, meterKey: 'propane:1' }]);
  });

  it('non-heating use per day is added to the modelled fuel and the fit still finds the factor', () => {
    const dryerKWhPerDay = 50;
    const bills = MONTHS.map(([start, end], index) => {
      const days = Math.round((Date.parse(end) - Date.parse(start)) / 86_400_000) + 1;
      return period(index, engineFuelKWh(start, end, 0.9) + dryerKWhPerDay * days, {
        nonHeatingFuelKWhPerDay: dryerKWhPerDay,
      });
    });
    const meter = calibrateHeatLoss(input(bills), ref, sun).meters[0];
    expect(meter.factor).toBeCloseTo(0.9, 3);
    expect(meter.nmbePercent!).toBeCloseTo(0, 3);
    expect(meter.meaning).toMatch(/about 10 % less heat loss/i);
  });

  it('refuses a fit from fewer than three bills, saying why', () => {
    const bills = [0, 1].map((index) => period(index, 5000));
    const meter = calibrateHeatLoss(input(bills), ref, sun).meters[0];
    expect(meter.fitted).toBe(false);
    expect(meter.factor).toBeNull();
    expect(meter.refusal).toMatch(/at least 3 bills with heating/);
  });

  it('refuses a fit from bills of months the house stood empty, and leaves such periods out', () => {
    // heated only from 1 October to 30 April
    const calendar = [{ startMonthDay: '10-01', endMonthDay: '04-30', mode: 'heated' as const }];
    const summer = [
      ['2026-06-15', '2026-07-04'],
      ['2026-07-05', '2026-07-24'],
      ['2026-07-25', '2026-08-13'],
    ].map(([startDate, endDate], index) => period(0, 100, { id: `s${index}`, startDate, endDate }));
    const houses = [{ id: '1', name: 'House 1', house: demo.house, calendar }];
    const meter = calibrateHeatLoss({ ...input(summer), houses }, ref, sun).meters[0];
    expect(meter.fitted).toBe(false);
    expect(meter.refusal).toMatch(/3 more fall in periods with no heating demand/);
    expect(meter.periods.every((p) => !p.usedInFit && p.handbookFuelKWh === 0)).toBe(true);
  });

  it('refuses a bill whose end comes before its start, naming the period', () => {
    const bad = period(0, 100, { startDate: '2026-02-10', endDate: '2026-02-01' });
    expect(() => calibrateHeatLoss(input([bad]), ref, sun)).toThrow(EngineInputError);
    try {
      calibrateHeatLoss(input([bad]), ref, sun);
    } catch (error) {
      expect((error as EngineInputError).field).toBe('periods[0].endDate');
    }
  });

  it('refuses a bill for a fuel none of its houses burns', () => {
    const bills = [0, 1, 2].map((index) => period(index, 1000, { fuelId: 'natural-gas' }));
    expect(() => calibrateHeatLoss(input(bills), ref, sun)).toThrow(/no heater burning natural gas/);
  });

  it('converts billed quantities with the fuel heat content of reference-data/fuels.json', () => {
    const propane = fuelRow(ref, 'propane');
    // 91,333 Btu per US gal (the table's value) × 1055.05585262 J/Btu ÷ 3.6 MJ/kWh = 26.767 kWh
    expect(fuelQuantityToKWh(1, 'US gal', propane)).toBeCloseTo(26.767, 3);
    // 25.456 MJ per L ÷ 3.6 = 7.0711 kWh
    expect(fuelQuantityToKWh(1, 'L', propane)).toBeCloseTo(7.0711, 4);
    const gas = fuelRow(ref, 'natural-gas');
    // 1 therm = 100,000 Btu = 29.3071 kWh (definition)
    expect(fuelQuantityToKWh(1, 'therm', gas)).toBeCloseTo(29.3071, 4);
    expect(() => fuelQuantityToKWh(1, 'therm', propane)).toThrow(/counted in L or US gal/);
  });
});

import { loadReferenceData } from '../testing/reference-data';
import { referenceRow } from '../reference-data.types';
import { degreeDayHeatKWh, FAHRENHEIT_DEGREES_PER_KELVIN, heatingDegreeDaysOfDay } from './degree-days';
import { fuelForHeat, JOULES_PER_BTU, type FuelRow } from './fuel';

const ref = loadReferenceData();
const celsius = (fahrenheit: number) => (fahrenheit - 32) / 1.8;

describe('heating degree-days', () => {
  const base65 = referenceRow<{ id: string; source: string; confidence: 'verified'; baseC: number; baseF: number }>(
    ref,
    'degree-days',
    'hdd-base-us',
  )!;

  // AMS Glossary of Meteorology "heating degree-day": one HDD per °F the daily mean is below 65 °F;
  // US EPA glossary: daily mean = (high + low) / 2. Check value quoted from the NWS definition:
  // high 60 °F, low 40 °F → mean 50 °F → 15 HDD.
  it('gives 15 HDD (base 65 °F) for a day with high 60 °F and low 40 °F', () => {
    expect(base65.baseF).toBe(65);
    const kelvinDays = heatingDegreeDaysOfDay(celsius(40), celsius(60), base65.baseC);
    expect(kelvinDays * FAHRENHEIT_DEGREES_PER_KELVIN).toBeCloseTo(15, 2);
  });

  it('counts nothing for a day whose mean is above the base (AMS: days above are ignored)', () => {
    expect(heatingDegreeDaysOfDay(celsius(60), celsius(80), base65.baseC)).toBe(0);
  });
});

describe('degree-day fuel method F = UA × 24 × DD / (H × η)', () => {
  // Bartok (Greenhouse Management, leaky roof vent): 28,000 Btu/h at 65 °F inside, 20 °F outside
  // = 672,000 Btu/day ≈ 6.47 gal No. 2 oil at 75 % with 138,500 Btu/gal (see handbook WE-2).
  // As degree-days: UA = 28,000 / 45 Btu/(h·°F), one day at mean 20 °F to base 65 °F = 45 °F·day.
  it('reproduces the published daily oil use', () => {
    const uaWPerK = (((28_000 / 45) * JOULES_PER_BTU) / 3600) * 1.8;
    const degreeDaysKDay = heatingDegreeDaysOfDay(celsius(20), celsius(20), celsius(65));
    expect(degreeDaysKDay * FAHRENHEIT_DEGREES_PER_KELVIN).toBeCloseTo(45, 9);
    const heatKWh = degreeDayHeatKWh(uaWPerK, degreeDaysKDay);
    expect((heatKWh * 3.6e6) / JOULES_PER_BTU).toBeCloseTo(672_000, -1);
    const oil: FuelRow = {
      id: 'oil-138500',
      label: 'No. 2 oil as in the article',
      fuelFired: true,
      unitSi: 'L',
      heatContentJPerUnitSi: 1,
      unitUs: 'US gal',
      heatContentBtuPerUnitUs: 138_500,
      source: 'Bartok, Greenhouse Management (leaky roof vent)',
      confidence: 'verified',
    };
    expect(fuelForHeat(heatKWh, oil, 0.75).quantityUs).toBeCloseTo(6.47, 2);
  });
});

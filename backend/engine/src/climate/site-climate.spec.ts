import { loadReferenceData } from '../testing/reference-data';
import { EngineInputError } from '../errors';
import { demoClimate } from '../season/demo-season';
import { clearnessByMonth, validateSiteClimate, type SiteClimate } from './site-climate';

const ref = loadReferenceData();

function fieldOf(run: () => unknown): string {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(EngineInputError);
    return (error as EngineInputError).field;
  }
  throw new Error('expected an EngineInputError');
}

describe('site climate', () => {
  it('accepts twelve months of sensible normals', () => {
    const climate = demoClimate();
    const untouched = structuredClone(climate);
    expect(() => validateSiteClimate(climate)).not.toThrow();
    // months given out of order are accepted too, and nothing is changed in place
    const shuffled = { ...climate, monthly: [...climate.monthly].reverse() };
    expect(() => validateSiteClimate(shuffled)).not.toThrow();
    expect(climate).toEqual(untouched);
  });

  it('names the offending field', () => {
    const swapped = demoClimate();
    swapped.monthly[3] = { month: 4, meanDailyMinC: 16, meanDailyMaxC: 3 };
    expect(fieldOf(() => validateSiteClimate(swapped))).toBe('climate.monthly[3].meanDailyMinC');

    const short: SiteClimate = { ...demoClimate(), monthly: demoClimate().monthly.slice(0, 11) };
    expect(fieldOf(() => validateSiteClimate(short))).toBe('climate.monthly');

    const repeated = demoClimate();
    repeated.monthly[11] = { ...repeated.monthly[11], month: 1 };
    expect(fieldOf(() => validateSiteClimate(repeated))).toBe('climate.monthly[11].month');

    const cloudy = demoClimate();
    cloudy.monthly[0].clearness = 1.2;
    expect(fieldOf(() => validateSiteClimate(cloudy))).toBe('climate.monthly[0].clearness');

    const frozen = demoClimate();
    frozen.monthly[0].meanDailyMinC = -80;
    expect(fieldOf(() => validateSiteClimate(frozen))).toBe('climate.monthly[0].meanDailyMinC');

    expect(fieldOf(() => validateSiteClimate({ ...demoClimate(), summerDesignWetBulbC: 40 }))).toBe(
      'climate.summerDesignWetBulbC',
    );
  });

  it('takes clearness from the climate where given and the reference default elsewhere', () => {
    const climate = demoClimate();
    climate.monthly[5].clearness = 0.3;
    const { clearness, fromUser } = clearnessByMonth(climate, ref);
    expect(clearness).toHaveLength(12);
    expect(clearness[5]).toBe(0.3);
    expect(fromUser[5]).toBe(true);
    expect(fromUser[0]).toBe(false);
    // The default is a placeholder (common practice): winters cloudier than summers, all within 0–1.
    const defaults = clearnessByMonth(null, ref).clearness;
    for (const value of defaults) expect(value).toBeGreaterThan(0.3);
    for (const value of defaults) expect(value).toBeLessThan(0.8);
    expect(defaults[6]).toBeGreaterThan(defaults[0]);
  });
});

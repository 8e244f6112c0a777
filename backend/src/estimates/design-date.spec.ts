import { loadReferenceData } from '../reference-data/load-reference-data';
import { defaultCoolingDesignDate, yearAtFarm } from './design-date';

describe('default cooling design date', () => {
  const ref = loadReferenceData();
  const midYear = new Date(Date.UTC(2026, 5, 10, 12));

  // 21 July north / 21 January south: common practice, no source (reference-data/estimate-defaults.json)
  it('takes 21 July in the northern hemisphere and 21 January in the southern', () => {
    expect(defaultCoolingDesignDate(45.56, midYear, 'America/Chicago', ref)).toBe('2026-07-21');
    expect(defaultCoolingDesignDate(-37.8, midYear, 'Australia/Melbourne', ref)).toBe('2026-01-21');
  });

  it('uses the year at the farm, not in UTC', () => {
    const newYearsEveUtc = new Date(Date.UTC(2026, 11, 31, 15));
    expect(yearAtFarm(newYearsEveUtc, 'Pacific/Auckland')).toBe(2027);
    expect(yearAtFarm(newYearsEveUtc, 'America/Chicago')).toBe(2026);
    expect(defaultCoolingDesignDate(-36.8, newYearsEveUtc, 'Pacific/Auckland', ref)).toBe('2027-01-21');
  });

  it('falls back to the UTC year for a time zone the runtime does not know', () => {
    expect(yearAtFarm(midYear, 'Not/A_Zone')).toBe(2026);
  });
});

import { EngineInputError } from '@thermbay/engine/errors';
import { defaultHeatingSeason, standardUtcOffsetHours, zoneOffsetHoursAt } from './site-time';

describe('standardUtcOffsetHours', () => {
  // Offsets are the zones' legal definitions (IANA tz database), not measured values.
  it('gives the winter offset of a northern zone that keeps daylight saving time', () => {
    expect(standardUtcOffsetHours('America/Chicago', 2027)).toBe(-6);
    expect(zoneOffsetHoursAt('America/Chicago', new Date(Date.UTC(2027, 6, 15, 12)))).toBe(-5);
  });

  it('gives the July (winter) offset of a southern zone', () => {
    expect(standardUtcOffsetHours('Australia/Sydney', 2027)).toBe(10);
    expect(zoneOffsetHoursAt('Australia/Sydney', new Date(Date.UTC(2027, 0, 15, 12)))).toBe(11);
  });

  it('handles half-hour zones, zones without daylight saving time and UTC', () => {
    expect(standardUtcOffsetHours('Asia/Kolkata', 2027)).toBe(5.5);
    expect(standardUtcOffsetHours('America/Phoenix', 2027)).toBe(-7);
    expect(standardUtcOffsetHours('UTC', 2027)).toBe(0);
  });

  it('names the farm time zone for an unknown zone', () => {
    expect(() => standardUtcOffsetHours('Mars/Olympus', 2027)).toThrow(EngineInputError);
    try {
      standardUtcOffsetHours('Mars/Olympus', 2027);
    } catch (error) {
      expect((error as EngineInputError).field).toBe('farm.timeZone');
    }
  });
});

describe('defaultHeatingSeason', () => {
  it('north: the season in progress from September to May', () => {
    expect(defaultHeatingSeason(45, new Date('2026-12-01T00:00:00Z'))).toEqual({
      startDate: '2026-09-01',
      endDate: '2027-05-31',
    });
    expect(defaultHeatingSeason(45, new Date('2027-03-10T00:00:00Z'))).toEqual({
      startDate: '2026-09-01',
      endDate: '2027-05-31',
    });
  });

  it('north: between seasons, the coming one', () => {
    expect(defaultHeatingSeason(45, new Date('2027-05-31T23:00:00Z'))).toEqual({
      startDate: '2026-09-01',
      endDate: '2027-05-31',
    });
    expect(defaultHeatingSeason(45, new Date('2027-06-01T00:00:00Z'))).toEqual({
      startDate: '2027-09-01',
      endDate: '2028-05-31',
    });
  });

  it('south: March to November, the coming one after November', () => {
    expect(defaultHeatingSeason(-34, new Date('2026-12-01T00:00:00Z'))).toEqual({
      startDate: '2027-03-01',
      endDate: '2027-11-30',
    });
    expect(defaultHeatingSeason(-34, new Date('2027-07-01T00:00:00Z'))).toEqual({
      startDate: '2027-03-01',
      endDate: '2027-11-30',
    });
  });
});

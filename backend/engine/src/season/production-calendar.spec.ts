import { type EngineInputError } from '../errors';
import { dayNumber } from '../climate/calendar-days';
import { dailySetpoints, delayFirstHeatedPeriod, shiftMonthDay, validateCalendar } from './production-calendar';

const setpoints = { dayHeatingC: 18, nightHeatingC: 15 };

describe('production calendar', () => {
  it('heats every day at the house setpoints without a calendar', () => {
    const { daySetpointC, nightSetpointC } = dailySetpoints(dayNumber(2026, 1, 1), 365, setpoints, null, 2);
    expect(daySetpointC.every((value) => value === 18)).toBe(true);
    expect(nightSetpointC.every((value) => value === 13)).toBe(true);
  });

  it('heats only the listed periods; wrapped periods cover the year end; later periods win', () => {
    const calendar = [
      { startMonthDay: '12-15', endMonthDay: '01-31', mode: 'heated' as const, nightHeatingC: 12 },
      { startMonthDay: '01-10', endMonthDay: '01-12', mode: 'empty' as const },
    ];
    const first = dayNumber(2026, 1, 1);
    const { daySetpointC, nightSetpointC } = dailySetpoints(first, 365, setpoints, calendar);
    const at = (month: number, day: number) => dayNumber(2026, month, day) - first;
    expect(nightSetpointC[at(1, 1)]).toBe(12);
    expect(daySetpointC[at(1, 1)]).toBe(18);
    expect(Number.isNaN(daySetpointC[at(1, 11)])).toBe(true);
    expect(Number.isNaN(daySetpointC[at(2, 1)])).toBe(true);
    expect(nightSetpointC[at(12, 15)]).toBe(12);
    expect(Number.isNaN(nightSetpointC[at(12, 14)])).toBe(true);
  });

  it('moves the first heated period of the season later', () => {
    const calendar = [
      { startMonthDay: '03-01', endMonthDay: '05-31', mode: 'heated' as const },
      { startMonthDay: '10-15', endMonthDay: '02-28', mode: 'heated' as const },
    ];
    const delayed = delayFirstHeatedPeriod(calendar, { month: 10, day: 1 }, 14);
    expect(delayed[1].startMonthDay).toBe('10-29');
    expect(delayed[0]).toBe(calendar[0]);
    expect(shiftMonthDay('12-25', 10)).toBe('01-04');
    // a delay longer than the period leaves it unheated rather than wrapping round the year
    const short = [{ startMonthDay: '10-15', endMonthDay: '10-20', mode: 'heated' as const }];
    expect(delayFirstHeatedPeriod(short, { month: 10, day: 1 }, 14)[0].mode).toBe('empty');
  });

  it('names malformed periods', () => {
    const field = (run: () => unknown) => {
      try {
        run();
      } catch (error) {
        return (error as EngineInputError).field;
      }
      return 'none';
    };
    expect(field(() => validateCalendar([{ startMonthDay: '02-30', endMonthDay: '03-01', mode: 'heated' }]))).toBe(
      'calendar[0].startMonthDay',
    );
    expect(
      field(() => validateCalendar([{ startMonthDay: '02-01', endMonthDay: '03-01', mode: 'warm' as never }])),
    ).toBe('calendar[0].mode');
    expect(
      field(() =>
        validateCalendar([{ startMonthDay: '02-01', endMonthDay: '03-01', mode: 'heated', nightHeatingC: 60 }]),
      ),
    ).toBe('calendar[0].nightHeatingC');
  });
});

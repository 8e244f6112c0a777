import { BOUNDS } from '@thermbay/engine/vocabulary';
import * as yup from 'yup';
import type { ProductionCalendarInput, ProductionPeriod } from '../../api/types';
import type { Units } from '../../lib/units';

export interface PeriodFormValues {
  startMonthDay: string;
  endMonthDay: string;
  mode: 'heated' | 'empty';
  /** in the user's temperature unit; '' = the house's own setpoint */
  dayHeatingC: string;
  nightHeatingC: string;
  label: string;
}

export interface CalendarFormValues {
  periods: PeriodFormValues[];
}

const DAYS_IN_MONTH = [31, 29, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

/** 'MM-DD' that names a real day (29 February allowed). */
export function isMonthDay(value: string | undefined): boolean {
  const match = /^(\d{2})-(\d{2})$/.exec(value ?? '');
  if (!match) return false;
  const month = Number(match[1]);
  const day = Number(match[2]);
  return month >= 1 && month <= 12 && day >= 1 && day <= DAYS_IN_MONTH[month - 1]!;
}

export function calendarFormValues(periods: ProductionPeriod[], units: Units): CalendarFormValues {
  return {
    periods: periods.map((period) => ({
      startMonthDay: period.startMonthDay,
      endMonthDay: period.endMonthDay,
      mode: period.mode,
      dayHeatingC: units.toInput('temperature', period.dayHeatingC ?? null),
      nightHeatingC: units.toInput('temperature', period.nightHeatingC ?? null),
      label: period.label ?? '',
    })),
  };
}

export function newPeriod(): PeriodFormValues {
  return {
    startMonthDay: '11-01',
    endMonthDay: '03-31',
    mode: 'heated',
    dayHeatingC: '',
    nightHeatingC: '',
    label: '',
  };
}

/** Typed periods → the API body (SI); an untouched setpoint goes back exactly as stored. */
export function toCalendarInput(
  values: CalendarFormValues,
  initial: CalendarFormValues,
  stored: ProductionPeriod[],
  units: Units,
): ProductionCalendarInput {
  const setpoint = (typed: string, initialTyped: string | undefined, storedC: number | undefined) => {
    if (typed.trim() === '') return undefined;
    if (storedC !== undefined && typed === initialTyped) return storedC;
    return units.fromDisplay('temperature', Number(typed));
  };
  return {
    periods: values.periods.map((period, index) => {
      const heated = period.mode === 'heated';
      const body: ProductionPeriod = {
        startMonthDay: period.startMonthDay,
        endMonthDay: period.endMonthDay,
        mode: period.mode,
      };
      const day = heated
        ? setpoint(period.dayHeatingC, initial.periods[index]?.dayHeatingC, stored[index]?.dayHeatingC)
        : undefined;
      const night = heated
        ? setpoint(period.nightHeatingC, initial.periods[index]?.nightHeatingC, stored[index]?.nightHeatingC)
        : undefined;
      if (day !== undefined) body.dayHeatingC = day;
      if (night !== undefined) body.nightHeatingC = night;
      if (period.label.trim()) body.label = period.label.trim();
      return body;
    }),
  };
}

export function calendarFormSchema(units: Units) {
  const range = units.range('temperature', BOUNDS.setpointC);
  const unit = units.label('temperature');
  const setpoint = yup
    .number()
    .transform((value: number, original: unknown) => (original === '' || original === null ? undefined : value))
    .typeError('Must be a number')
    .min(range.min, `Between ${range.min} and ${range.max} ${unit}`)
    .max(range.max, `Between ${range.min} and ${range.max} ${unit}`)
    .optional();
  const monthDay = yup
    .string()
    .required('Write MM-DD')
    .test('month-day', 'Write a real day as MM-DD, e.g. 11-15', isMonthDay);
  return yup.object({
    periods: yup
      .array(
        yup.object({
          startMonthDay: monthDay,
          endMonthDay: monthDay,
          mode: yup.mixed<'heated' | 'empty'>().oneOf(['heated', 'empty']).required(),
          dayHeatingC: setpoint,
          nightHeatingC: setpoint,
          label: yup.string().max(100, 'At most 100 characters'),
        }),
      )
      .max(24, 'At most 24 periods'),
  });
}

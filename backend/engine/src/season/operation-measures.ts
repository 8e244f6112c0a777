import { EngineInputError, requireInRange } from '../errors';
import { quantityToken } from '../vocabulary';
import { civilDate, dayNumber, isoDate, parseIsoDate } from '../climate/calendar-days';
import type { SeasonVariant } from '../estimate-season';
import { fuelCost, fuelForHeat, validateFuelPrice, validateHeaterEfficiency, type FuelPrice } from './fuel';
import { measureDefaults, notApplicable, percent, type MeasureContext, type PreparedMeasure } from './measure-plan';
import type { Measure } from './measure-types';
import { delayFirstHeatedPeriod } from './production-calendar';
import { heaterTypeRow } from '../heating/heating-reference';
import { requireHhvEfficiency } from '../heating/heater-sizing';

/** Measures that change how the house is run or heated: setpoints, dates, heaters, fuel. */

export function planNightSetpointLower(
  measure: Extract<Measure, { kind: 'night-setpoint-lower' }>,
  context: MeasureContext,
): PreparedMeasure {
  const { field, base, ref } = context;
  const defaults = measureDefaults(ref, 'night-setpoint-lower');
  const lowerByK = requireInRange(`${field}.lowerByK`, measure.lowerByK ?? defaults.defaultLowerByK, 0, 15);
  const description = `night setpoint lowered by ${quantityToken('temperatureDifference', lowerByK)}`;
  if (lowerByK === 0) return notApplicable(base, description, 'Lowering the setpoint by nothing changes nothing.');
  return {
    variant: base,
    options: { nightSetpointLowerK: lowerByK },
    description,
    lightChange: null,
    notes: ['Check that the crop tolerates the cooler nights; growth may slow.'],
    notApplicableReason: null,
  };
}

export function planLaterStart(
  measure: Extract<Measure, { kind: 'later-start' }>,
  context: MeasureContext,
): PreparedMeasure {
  const { field, base, ref } = context;
  const defaults = measureDefaults(ref, 'later-start');
  const delayDays = requireInRange(`${field}.delayDays`, measure.delayDays ?? defaults.defaultDelayDays, 1, 180);
  if (!Number.isInteger(delayDays)) throw new EngineInputError(`${field}.delayDays`, 'delay must be whole days');
  const start = parseIsoDate(base.season.startDate)!;
  if (base.calendar && base.calendar.length > 0) {
    const description = `first heated period starts ${delayDays} days later`;
    if (!base.calendar.some((period) => period.mode === 'heated')) {
      return notApplicable(base, description, 'The production calendar has no heated period to start later.');
    }
    return {
      variant: { ...base, calendar: delayFirstHeatedPeriod(base.calendar, start, delayDays) },
      options: {},
      description,
      lightChange: null,
      notes: [],
      notApplicableReason: null,
    };
  }
  const end = parseIsoDate(base.season.endDate)!;
  const shifted = dayNumber(start.year, start.month, start.day) + delayDays;
  const description = `heating starts ${delayDays} days later`;
  if (shifted > dayNumber(end.year, end.month, end.day)) {
    return notApplicable(base, description, 'The delay is longer than the season, so nothing would be heated.');
  }
  return {
    variant: { ...base, season: { ...base.season, startDate: isoDate(civilDate(shifted)) } },
    options: {},
    description,
    lightChange: null,
    notes: [],
    notApplicableReason: null,
  };
}

export function planHeaterEfficiency(
  measure: Extract<Measure, { kind: 'heater-efficiency' }>,
  context: MeasureContext,
): PreparedMeasure {
  const { field, base, ref } = context;
  const defaults = measureDefaults(ref, 'heater-efficiency');
  const heaterType = measure.heaterType ?? defaults.defaultHeaterType;
  if (!heaterType) throw new Error('reference-data/measures.json heater-efficiency needs a defaultHeaterType');
  const typeRow = heaterTypeRow(ref, heaterType, `${field}.heaterType`);
  const efficiency = validateHeaterEfficiency(measure.efficiency ?? typeRow.typicalEfficiency, `${field}.efficiency`);
  requireHhvEfficiency(`${field}.efficiency`, efficiency, base.fuelRow);
  const description = `heaters replaced (${typeRow.label}): efficiency ${percent(base.heaterEfficiency)} → ${percent(efficiency)}`;
  if (!(efficiency > base.heaterEfficiency)) {
    return notApplicable(
      base,
      description,
      `The heaters are already ${percent(base.heaterEfficiency)} efficient; ${percent(efficiency)} is no better.`,
    );
  }
  return {
    // Replacement units are taken to give the same output, so the heater limit stays.
    variant: { ...base, heaterEfficiency: efficiency },
    options: {},
    description,
    lightChange: null,
    notes: [],
    notApplicableReason: null,
  };
}

export function planFuelSwitch(
  measure: Extract<Measure, { kind: 'fuel-switch' }>,
  context: MeasureContext,
): PreparedMeasure {
  const { field, base, ref } = context;
  const fuel = measure.fuel;
  if (!fuel || typeof fuel !== 'object' || fuel.pricePerUnit === undefined || fuel.pricePerUnit === null) {
    return notApplicable(base, 'another fuel', 'Give the other fuel and its price to compare it.');
  }
  const row = validateFuelPrice(fuel, ref, `${field}.fuel`);
  if (base.fuel.pricePerUnit === null) {
    return notApplicable(
      base,
      `${base.fuelRow.label} → ${row.label}`,
      `Enter the price of ${base.fuelRow.label} first: fuels can only be compared by what they cost.`,
    );
  }
  const efficiency =
    measure.efficiency === undefined || measure.efficiency === null
      ? base.heaterEfficiency
      : validateHeaterEfficiency(measure.efficiency, `${field}.efficiency`);
  requireHhvEfficiency(`${field}.efficiency`, efficiency, row);
  const description = `${base.fuelRow.label} → ${row.label} at ${fuel.pricePerUnit} per ${fuel.priceUnit === 'si' ? row.unitSi : row.unitUs}`;
  const basePrice = pricePerFuelKWh(base.fuel, base.fuelRow);
  const samePrice =
    row.id === base.fuelRow.id &&
    Math.abs(pricePerFuelKWh(fuel, row) - basePrice) <= 1e-9 * Math.max(1, basePrice) &&
    efficiency <= base.heaterEfficiency;
  if (samePrice)
    return notApplicable(base, description, 'That is the fuel, price and efficiency the house already has.');
  return {
    variant: { ...base, fuel, fuelRow: row, heaterEfficiency: efficiency },
    options: {},
    description,
    lightChange: null,
    notes: [],
    notApplicableReason: null,
  };
}

/** Money per kWh of fuel burnt, to tell whether two prices of one fuel are the same. */
function pricePerFuelKWh(price: FuelPrice, row: SeasonVariant['fuelRow']): number {
  return fuelCost(fuelForHeat(1, row, 1), price) ?? 0;
}

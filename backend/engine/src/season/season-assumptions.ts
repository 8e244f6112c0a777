import { quantityToken, type Confidence } from '../vocabulary';
import { referenceRow, type ReferenceData, type ReferenceRow } from '../reference-data.types';
import { PEAK_ROW_ID, peakHoursAfterSolarNoon } from '../climate/daily-temperature-curve';
import { DEFAULT_CLEARNESS_ROW_ID, type SiteClimate } from '../climate/site-climate';
import { cloudCoverTenthsFromClearness, skyConstants } from '../heating/sky-radiation';
import { shadeClothInWords } from '../solar/shade-cloth';
import { priceUnitLabel } from './fuel';
import type { HouseThermal } from './house-heat-loss';
import { isLoggedTemperatures, type LoggedTemperatures } from './season-hours';
import type { Assumption, PreparedSeason, SeasonVariant } from './season-types';
import {
  LAMP_HEAT_DEFAULT_ROW_ID,
  LAMP_SCHEDULE_ROW_ID,
  lampMethodRow,
  lampPower,
  lampsInUse,
  namedLampType,
} from '../lamps/lamps';

/** The assumptions behind a season estimate, each with its source and confidence. */

function rowAssumption(
  key: string,
  label: string,
  value: number | string,
  unit: string,
  row: ReferenceRow,
  overridden = false,
): Assumption {
  return {
    key,
    label,
    value,
    unit,
    source: overridden ? 'entered by the user' : row.source,
    confidence: overridden ? 'user-entered' : row.confidence,
    overridden,
  };
}

export function seasonAssumptions(
  prepared: PreparedSeason,
  variant: SeasonVariant,
  thermal: HouseThermal,
  ref: ReferenceData,
): Assumption[] {
  const list: Assumption[] = [];
  const derived = (key: string, label: string, value: number | string, unit: string, source: string): Assumption => ({
    key,
    label,
    value,
    unit,
    source,
    confidence: 'derived',
    overridden: false,
  });
  list.push(
    derived(
      'ua-curtain-open',
      'Heat-loss coefficient, curtain open (coverings, perimeter and air leakage)',
      round(thermal.uaOpenWPerK, 1),
      'W/K',
      'computed from reference-data coverings.json, perimeter.json, air-leakage.json and the house dimensions',
    ),
  );
  const factor = prepared.input.heatLossFactor ?? 1;
  if (factor !== 1) {
    list.push({
      key: 'heat-loss-factor',
      label: 'Heat-loss factor fitted to the farm’s fuel bills (multiplies the heat-loss coefficients above)',
      value: round(factor, 3),
      unit: '–',
      source: 'calibrated against the fuel records entered for this farm',
      confidence: 'user-entered',
      overridden: true,
    });
  }
  if (variant.house.curtainId) {
    list.push(
      derived(
        'ua-curtain-closed',
        'Heat-loss coefficient, curtain drawn (sunset to sunrise)',
        round(thermal.uaClosedWPerK, 1),
        'W/K',
        'computed with the curtain row of reference-data/curtains.json',
      ),
    );
  }
  const roof = thermal.roofCovering;
  list.push({
    key: 'roof-light-transmittance',
    label: `Light transmittance of the roof covering (${roof.label ?? roof.id})`,
    value: roof.lightTransmittance,
    unit: '–',
    source: roof.lightSource ?? roof.source,
    confidence: roof.lightConfidence ?? roof.confidence,
    overridden: false,
  });
  if (variant.house.shadeCloth) {
    list.push({
      key: 'shade-cloth',
      label: 'Shade cloth: the daytime solar gain is multiplied by the share it passes in the months it is in place',
      value: shadeClothInWords(variant.house.shadeCloth),
      unit: '',
      source: 'The house as entered (typical cloths in reference-data/shade-cloths.json)',
      confidence: 'user-entered',
      overridden: false,
    });
  }
  list.push(
    rowAssumption(
      'solar-useful-fraction',
      prepared.solarUsefulFractionRow.label ?? 'Share of transmitted sunlight that offsets heating',
      prepared.solarUsefulFraction,
      '–',
      prepared.solarUsefulFractionRow,
      prepared.input.solarUsefulFraction !== undefined && prepared.input.solarUsefulFraction !== null,
    ),
  );
  const clearnessRow = referenceRow(ref, 'climate-defaults', DEFAULT_CLEARNESS_ROW_ID)!;
  list.push(
    rowAssumption(
      'clearness-by-month',
      'Sky clearness, January to December (actual ÷ clear-sky sunlight)',
      prepared.clearness.map((value) => value.toFixed(2)).join(' '),
      '–',
      clearnessRow,
      prepared.clearnessFromUser,
    ),
  );
  list.push(...skyAssumptions(prepared, thermal, ref));
  list.push({
    key: 'clear-sky-model',
    label: 'Clear-sky sunlight on a horizontal surface, by month',
    value: 'monthly A, B, C coefficients',
    unit: '',
    source: referenceRow(ref, 'clear-sky', 'month-01')?.source ?? 'reference-data/clear-sky.json',
    confidence: referenceRow(ref, 'clear-sky', 'month-01')?.confidence ?? 'memory',
    overridden: false,
  });
  if (!isLoggedTemperatures(prepared.input.climate as SiteClimate | LoggedTemperatures)) {
    const minimumRow = referenceRow(ref, 'climate-defaults', 'daily-curve-minimum-at-sunrise');
    if (minimumRow)
      list.push(
        rowAssumption('daily-curve-minimum', 'Daily minimum temperature at sunrise', 'sunrise', '', minimumRow),
      );
  }
  const peakRow = referenceRow(ref, 'climate-defaults', PEAK_ROW_ID)!;
  list.push(
    rowAssumption(
      'daily-curve-peak',
      peakRow.label ?? 'Daily maximum after solar noon',
      peakHoursAfterSolarNoon(ref),
      'h',
      peakRow,
    ),
  );
  list.push({
    key: 'daily-curve-interpolation',
    label:
      'Days between monthly normals: straight-line interpolation between mid-month values; half-cosine curve from minimum to maximum',
    value: 'cosine',
    unit: '',
    source: 'common practice, no single source',
    confidence: 'common-practice',
    overridden: false,
  });
  const fuel = variant.fuelRow;
  list.push(
    rowAssumption(
      'fuel-heat-content-si',
      `Heat content of ${fuel.label}`,
      fuel.heatContentJPerUnitSi / 1e6,
      `MJ/${fuel.unitSi}`,
      fuel,
    ),
  );
  list.push({
    ...rowAssumption(
      'fuel-heat-content-us',
      `Heat content of ${fuel.label}`,
      fuel.heatContentBtuPerUnitUs,
      `Btu/${fuel.unitUs}`,
      fuel,
    ),
    confidence: (fuel.usConfidence as Confidence | undefined) ?? fuel.confidence,
  });
  list.push(
    derived(
      'installed-heater-output',
      'Installed heater output (count × rated input × efficiency); heat delivered in an hour is capped at it',
      round(variant.heaterOutputW, 0),
      'W',
      "computed from the house's heater groups",
    ),
  );
  list.push({
    key: 'heater-efficiency',
    label: 'Heater efficiency (output ÷ input)',
    value: variant.heaterEfficiency,
    unit: '–',
    source: 'entered by the user',
    confidence: 'user-entered',
    overridden: true,
  });
  list.push({
    key: 'fuel-price',
    label: `Price of ${fuel.label}`,
    value: variant.fuel.pricePerUnit ?? 'not entered yet, so no cost is computed',
    unit: variant.fuel.pricePerUnit === null ? '' : `per ${priceUnitLabel(fuel, variant.fuel.priceUnit)}`,
    source: variant.fuel.pricePerUnit === null ? 'none' : 'entered by the user',
    confidence: 'user-entered',
    overridden: true,
  });
  list.push(...lampAssumptions(variant, thermal, ref));
  const baseRow = referenceRow(ref, 'degree-days', 'greenhouse-base-night-setpoint');
  if (baseRow)
    list.push(rowAssumption('degree-day-base', 'Degree-day base: the night setpoint', 'night setpoint', '°C', baseRow));
  list.push({
    key: 'local-standard-time',
    label: 'Hours are local standard time (daylight saving time ignored)',
    value: prepared.input.site.utcOffsetHours,
    unit: 'h from UTC',
    source: 'method',
    confidence: 'common-practice',
    overridden: false,
  });
  list.push({
    key: 'no-heat-storage',
    label: 'Each hour balances on its own: heat stored in soil, structure and crop is not modelled',
    value: 1,
    unit: 'h time step',
    source: 'method',
    confidence: 'common-practice',
    overridden: false,
  });
  return list;
}

/** The lamps' input, their heat share and when they run, each with where it came from. */
function lampAssumptions(variant: SeasonVariant, thermal: HouseThermal, ref: ReferenceData): Assumption[] {
  const lamps = variant.house.lamps;
  if (!lamps) return [];
  const user = (key: string, label: string, value: number | string, unit: string): Assumption => ({
    key,
    label,
    value,
    unit,
    source: 'entered for this house',
    confidence: 'user-entered',
    overridden: true,
  });
  const type = namedLampType(lamps, ref);
  const defaultRow = type ?? lampMethodRow(ref, LAMP_HEAT_DEFAULT_ROW_ID);
  const defaultShare = typeof defaultRow.heatToHouseFraction === 'number' ? defaultRow.heatToHouseFraction : null;
  const power = lampPower(lamps, thermal.geometry.floorAreaM2);
  const list: Assumption[] = [
    user(
      'lamps.power-density',
      type
        ? `Supplemental lamps (${type.label ?? type.id}): electrical input per floor area`
        : 'Supplemental lamps: electrical input per floor area',
      lamps.powerDensityWPerM2,
      'W/m²',
    ),
    user(
      'lamps.hours-per-day',
      'Hours the lamps run per day, January to December (heated days only)',
      lamps.hoursPerDayByMonth.join(' '),
      'h',
    ),
    defaultShare !== null && Math.abs(defaultShare - lamps.heatToHouseFraction) < 1e-9
      ? rowAssumption(
          'lamps.heat-to-house',
          `Share of the lamps' input that heats the house (${quantityToken('power', power.heatW)} of ${quantityToken('power', power.electricW)} while they run)`,
          lamps.heatToHouseFraction,
          '–',
          defaultRow,
        )
      : user(
          'lamps.heat-to-house',
          `Share of the lamps' input that heats the house (${quantityToken('power', power.heatW)} of ${quantityToken('power', power.electricW)} while they run)`,
          lamps.heatToHouseFraction,
          '–',
        ),
  ];
  if (lampsInUse(lamps)) {
    const schedule = lampMethodRow(ref, LAMP_SCHEDULE_ROW_ID);
    list.push(rowAssumption('lamps.schedule', schedule.label ?? LAMP_SCHEDULE_ROW_ID, 'ends at sunrise', '', schedule));
  }
  list.push({
    key: 'lamps.surplus',
    label: "Lamp heat counts only up to the hour's heat loss; what is left over is vented, not stored",
    value: 1,
    unit: 'h time step',
    source: 'method',
    confidence: 'common-practice',
    overridden: false,
  });
  return list;
}

/** The night sky: cloud cover, dew point, emissivities, and the house's coupling to it. */
function skyAssumptions(prepared: PreparedSeason, thermal: HouseThermal, ref: ReferenceData): Assumption[] {
  const sky = skyConstants(ref);
  const rows = sky.rows;
  const list: Assumption[] = [
    rowAssumption(
      'sky-cloud-cover',
      'Cloud cover of the night sky, January to December, from the month’s clearness (Kasten & Czeplak, inverted)',
      prepared.clearness.map((value) => cloudCoverTenthsFromClearness(value, sky).toFixed(1)).join(' '),
      'tenths',
      rows.cloudFromClearness,
    ),
  ];
  const fromClimate = prepared.dewPointCByMonth;
  if (fromClimate) {
    list.push({
      key: 'sky-dew-point',
      label:
        'Dew point of the night air, January to December (the climate’s; the day’s minimum where a month has none)',
      value: fromClimate.map((value) => (value === null ? '–' : value.toFixed(1))).join(' '),
      unit: '°C',
      source: 'the farm’s climate',
      confidence: 'user-entered',
      overridden: true,
    });
  } else {
    list.push(
      rowAssumption(
        'sky-dew-point',
        'Dew point of the night air: the day’s minimum temperature less this (the climate gives no dew point)',
        sky.nightDewPointBelowDailyMinimumK,
        'K',
        rows.nightDewPoint,
      ),
    );
  }
  list.push(
    rowAssumption(
      'sky-clear-emissivity',
      'Clear-sky emissivity from the dew point',
      'Berdahl & Martin',
      '',
      rows.clearSky,
    ),
    rowAssumption('sky-cloud-factor', 'Clouds raise the sky’s emissivity', 'Clark & Allen', '', rows.cloud),
  );
  const roof = thermal.roofCovering;
  list.push({
    key: 'sky-roof-ir-transmittance',
    label: `Long-wave share the roof passes to the sky (${roof.label ?? roof.id}); none while a curtain is drawn`,
    value: thermal.skyOpen.thermalIrTransmittance,
    unit: '–',
    source: roof.irSource ?? roof.source,
    confidence: roof.irConfidence ?? roof.confidence,
    overridden: false,
  });
  list.push(
    rowAssumption('sky-crop-emissivity', 'Long-wave emissivity of the crop', sky.cropEmissivity, '–', rows.crop),
    {
      key: 'sky-night-only',
      label:
        'The sky loss is counted from sunset to sunrise; by day the net share of sunlight that offsets heating stands for the whole radiation balance',
      value: 'night',
      unit: '',
      source: 'method (common practice, no source)',
      confidence: 'common-practice',
      overridden: false,
    },
  );
  return list;
}

function round(value: number, digits: number): number {
  const factor = 10 ** digits;
  return Math.round(value * factor) / factor;
}

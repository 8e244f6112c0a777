import type { ApiError } from '../../api/client';
import type { House, HouseInput, HouseShape, ReferenceData, SurfaceGroup } from '../../api/types';
import { MONTH_NAMES, type HeaterType } from '@thermbay/engine/vocabulary';

export { MONTH_NAMES };
import type { Quantity, Units } from '../../lib/units';

export const HOUSE_SHAPES: readonly HouseShape[] = ['gable', 'gothic-arch', 'quonset'];
export const SHAPE_LABELS: Record<HouseShape, string> = {
  gable: 'Gable',
  'gothic-arch': 'Gothic arch',
  quonset: 'Quonset (hoop)',
};
export const SURFACE_GROUPS: readonly SurfaceGroup[] = ['roof', 'sidewalls', 'endwalls'];
export const SURFACE_LABELS: Record<SurfaceGroup, string> = {
  roof: 'Roof',
  sidewalls: 'Sidewalls',
  endwalls: 'Endwalls',
};

/**
 * What the form holds. Field names match the API's (so a server error naming `widthM` or
 * `heaters.0.ratedInputW` lands on the right input), but every number is the string the user
 * typed in THEIR unit system: `widthM` holds feet for a US user. Converted to SI on submit.
 */
export interface HeaterFormValues {
  count: string;
  /** per unit, in kW (SI) or Btu/h (US) */
  ratedInputW: string;
  /** percent */
  efficiency: string;
  fuelId: string;
  /** '' = not stated */
  heaterType: string;
}

/** The shade cloth part of the form (field paths match the API's `shadeCloth.…`). */
export interface ShadeClothFormValues {
  /** false: no cloth (the rest is kept while the box is unticked, and not sent) */
  present: boolean;
  /** percent of the sun the cloth lets through, as typed */
  solarTransmittance: string;
  /** calendar months ticked, 1 = January, in order */
  months: number[];
}

/** Supplemental lamps as typed: density in the user's unit, hours per month, heat share in percent. */
export interface LampFormValues {
  /** '' = not stated */
  lampTypeId: string;
  /** W/m² (SI) or W/ft² (US) */
  powerDensityWPerM2: string;
  /** January to December, h */
  hoursPerDayByMonth: string[];
  /** percent */
  heatToHouseFraction: string;
}

/** Jan … Dec, from the one list of month names in the vocabulary. */
export const MONTH_LABELS = MONTH_NAMES.map((name) => name.slice(0, 3));

export const NO_LAMPS: LampFormValues = {
  lampTypeId: '',
  powerDensityWPerM2: '',
  hoursPerDayByMonth: Array.from({ length: 12 }, () => ''),
  heatToHouseFraction: '',
};

export interface HouseFormValues {
  name: string;
  notes: string;
  shape: HouseShape;
  spans: string;
  widthM: string;
  lengthM: string;
  eaveHeightM: string;
  ridgeHeightM: string;
  coverings: Record<SurfaceGroup, string>;
  coveringUOverridesWPerM2K: Record<SurfaceGroup, string>;
  airLeakageClassId: string;
  airChangesPerHourOverride: string;
  perimeterInsulated: boolean;
  /** '' = no curtain */
  curtainId: string;
  /** '' = none */
  kneewallHeightM: string;
  /** '' = glazing to the ground */
  kneewallId: string;
  shadeCloth: ShadeClothFormValues;
  heaters: HeaterFormValues[];
  exhaustFans: { count: string; capacityEachM3PerS: string };
  inletAreaM2: string;
  setpoints: { dayHeatingC: string; nightHeatingC: string; coolingC: string };
  /** whether the house has supplemental lamps; `lamps` is checked and sent only then */
  lampsOn: boolean;
  lamps: LampFormValues;
}

function firstRowId(referenceData: ReferenceData, table: string, preferredId?: string): string {
  const rows = referenceData[table]?.rows ?? [];
  return rows.find((row) => row.id === preferredId)?.id ?? rows[0]?.id ?? '';
}

/**
 * A new house starts as a common freestanding 30 × 96 ft double-poly gable with two unit heaters
 * and two exhaust fans (common practice, no source): the user edits from something plausible.
 */
export function newHouseDefaults(referenceData: ReferenceData): HouseInput {
  const covering = firstRowId(referenceData, 'coverings', 'poly-double-inflated');
  return {
    name: '',
    notes: null,
    shape: 'gable',
    spans: 1,
    widthM: 9.144,
    lengthM: 29.2608,
    eaveHeightM: 2.4384,
    ridgeHeightM: 4.2672,
    coverings: { roof: covering, sidewalls: covering, endwalls: covering },
    coveringUOverridesWPerM2K: {},
    airLeakageClassId: firstRowId(referenceData, 'air-leakage'),
    airChangesPerHourOverride: null,
    perimeterInsulated: false,
    curtainId: null,
    kneewallHeightM: null,
    kneewallId: null,
    shadeCloth: null,
    heaters: [
      { count: 2, ratedInputW: 73_000, efficiency: 0.8, fuelId: firstRowId(referenceData, 'fuels', 'natural-gas') },
    ],
    exhaustFans: { count: 2, capacityEachM3PerS: 4.7 },
    inletAreaM2: 2.4,
    setpoints: { dayHeatingC: 18, nightHeatingC: 15.5, coolingC: 26 },
    lamps: null,
  };
}

const pct = (fraction: number) => String(Math.round(fraction * 1000) / 10);

export function houseToFormValues(house: HouseInput, units: Units): HouseFormValues {
  const t = (quantity: Quantity, siValue: number | null | undefined) => units.toInput(quantity, siValue);
  return {
    name: house.name,
    notes: house.notes ?? '',
    shape: house.shape,
    spans: String(house.spans),
    widthM: t('length', house.widthM),
    lengthM: t('length', house.lengthM),
    eaveHeightM: t('length', house.eaveHeightM),
    ridgeHeightM: t('length', house.ridgeHeightM),
    coverings: { ...house.coverings },
    coveringUOverridesWPerM2K: {
      roof: t('uValue', house.coveringUOverridesWPerM2K?.roof),
      sidewalls: t('uValue', house.coveringUOverridesWPerM2K?.sidewalls),
      endwalls: t('uValue', house.coveringUOverridesWPerM2K?.endwalls),
    },
    airLeakageClassId: house.airLeakageClassId,
    airChangesPerHourOverride:
      house.airChangesPerHourOverride === null || house.airChangesPerHourOverride === undefined
        ? ''
        : String(house.airChangesPerHourOverride),
    perimeterInsulated: house.perimeterInsulated,
    curtainId: house.curtainId ?? '',
    kneewallHeightM: t('length', house.kneewallHeightM),
    kneewallId: house.kneewallId ?? '',
    shadeCloth: house.shadeCloth
      ? {
          present: true,
          solarTransmittance: pct(house.shadeCloth.solarTransmittance),
          months: [...house.shadeCloth.months].sort((a, b) => a - b),
        }
      : { present: false, solarTransmittance: '', months: [] },
    heaters: house.heaters.map((heater) => ({
      count: String(heater.count),
      ratedInputW: t('power', heater.ratedInputW),
      efficiency: pct(heater.efficiency),
      fuelId: heater.fuelId,
      heaterType: heater.heaterType ?? '',
    })),
    exhaustFans: {
      count: String(house.exhaustFans.count),
      capacityEachM3PerS: t('airFlow', house.exhaustFans.capacityEachM3PerS),
    },
    inletAreaM2: t('area', house.inletAreaM2),
    setpoints: {
      dayHeatingC: t('temperature', house.setpoints.dayHeatingC),
      nightHeatingC: t('temperature', house.setpoints.nightHeatingC),
      coolingC: t('temperature', house.setpoints.coolingC),
    },
    lampsOn: Boolean(house.lamps),
    lamps: house.lamps
      ? {
          lampTypeId: house.lamps.lampTypeId ?? '',
          powerDensityWPerM2: t('powerPerFloorArea', house.lamps.powerDensityWPerM2),
          hoursPerDayByMonth: house.lamps.hoursPerDayByMonth.map(String),
          heatToHouseFraction: pct(house.lamps.heatToHouseFraction),
        }
      : NO_LAMPS,
  };
}

/**
 * Form strings (user's units) → the API body (SI). A number the user did not change keeps its
 * stored SI value exactly, so opening and saving a house never drifts it by rounding.
 */
export function formValuesToHouseInput(
  values: HouseFormValues,
  initialValues: HouseFormValues,
  original: HouseInput,
  units: Units,
): HouseInput {
  const si = (quantity: Quantity, typed: string, initialTyped: string | undefined, originalSi: number | undefined) =>
    originalSi !== undefined && initialTyped !== undefined && typed === initialTyped
      ? originalSi
      : units.fromDisplay(quantity, Number(typed));
  const optionalSi = (
    quantity: Quantity,
    typed: string,
    initialTyped: string | undefined,
    originalSi: number | undefined,
  ) => (typed.trim() === '' ? undefined : si(quantity, typed, initialTyped, originalSi));

  const uOverrides: Partial<Record<SurfaceGroup, number>> = {};
  for (const group of SURFACE_GROUPS) {
    const value = optionalSi(
      'uValue',
      values.coveringUOverridesWPerM2K[group],
      initialValues.coveringUOverridesWPerM2K[group],
      original.coveringUOverridesWPerM2K?.[group],
    );
    if (value !== undefined) uOverrides[group] = value;
  }

  return {
    name: values.name.trim(),
    notes: values.notes.trim() === '' ? null : values.notes,
    shape: values.shape,
    spans: Number(values.spans),
    widthM: si('length', values.widthM, initialValues.widthM, original.widthM),
    lengthM: si('length', values.lengthM, initialValues.lengthM, original.lengthM),
    eaveHeightM: si('length', values.eaveHeightM, initialValues.eaveHeightM, original.eaveHeightM),
    ridgeHeightM: si('length', values.ridgeHeightM, initialValues.ridgeHeightM, original.ridgeHeightM),
    coverings: { ...values.coverings },
    coveringUOverridesWPerM2K: uOverrides,
    airLeakageClassId: values.airLeakageClassId,
    airChangesPerHourOverride:
      values.airChangesPerHourOverride.trim() === '' ? null : Number(values.airChangesPerHourOverride),
    perimeterInsulated: values.perimeterInsulated,
    curtainId: values.curtainId === '' ? null : values.curtainId,
    kneewallHeightM:
      optionalSi(
        'length',
        values.kneewallHeightM,
        initialValues.kneewallHeightM,
        original.kneewallHeightM ?? undefined,
      ) ?? null,
    kneewallId: values.kneewallId === '' ? null : values.kneewallId,
    shadeCloth: values.shadeCloth.present
      ? {
          // an untouched share goes back as stored, not as a rounded round trip through percent
          solarTransmittance:
            original.shadeCloth &&
            initialValues.shadeCloth.present &&
            values.shadeCloth.solarTransmittance === initialValues.shadeCloth.solarTransmittance
              ? original.shadeCloth.solarTransmittance
              : Number(values.shadeCloth.solarTransmittance) / 100,
          months: [...new Set(values.shadeCloth.months)].sort((a, b) => a - b),
        }
      : null,
    heaters: values.heaters.map((heater, index) => {
      const initialHeater = initialValues.heaters[index];
      const originalHeater = original.heaters[index];
      return {
        count: Number(heater.count),
        ratedInputW: si('power', heater.ratedInputW, initialHeater?.ratedInputW, originalHeater?.ratedInputW),
        efficiency:
          originalHeater && initialHeater && heater.efficiency === initialHeater.efficiency
            ? originalHeater.efficiency
            : Number(heater.efficiency) / 100,
        fuelId: heater.fuelId,
        heaterType: heater.heaterType === '' ? null : (heater.heaterType as HeaterType),
      };
    }),
    exhaustFans: {
      count: Number(values.exhaustFans.count),
      capacityEachM3PerS: si(
        'airFlow',
        values.exhaustFans.capacityEachM3PerS,
        initialValues.exhaustFans.capacityEachM3PerS,
        original.exhaustFans.capacityEachM3PerS,
      ),
    },
    inletAreaM2: si('area', values.inletAreaM2, initialValues.inletAreaM2, original.inletAreaM2),
    lamps: values.lampsOn
      ? lampsInput(values.lamps, initialValues.lampsOn ? initialValues.lamps : null, original.lamps ?? null, units)
      : null,
    setpoints: {
      dayHeatingC: si(
        'temperature',
        values.setpoints.dayHeatingC,
        initialValues.setpoints.dayHeatingC,
        original.setpoints.dayHeatingC,
      ),
      nightHeatingC: si(
        'temperature',
        values.setpoints.nightHeatingC,
        initialValues.setpoints.nightHeatingC,
        original.setpoints.nightHeatingC,
      ),
      coolingC: si(
        'temperature',
        values.setpoints.coolingC,
        initialValues.setpoints.coolingC,
        original.setpoints.coolingC,
      ),
    },
  };
}

/** The lamps as the API takes them; a number still showing its stored value keeps that exact SI value. */
function lampsInput(
  typed: LampFormValues,
  initial: LampFormValues | null,
  original: NonNullable<HouseInput['lamps']> | null,
  units: Units,
): NonNullable<HouseInput['lamps']> {
  const untouched = (key: 'powerDensityWPerM2' | 'heatToHouseFraction') =>
    original !== null && initial !== null && typed[key] === initial[key];
  return {
    lampTypeId: typed.lampTypeId === '' ? null : typed.lampTypeId,
    powerDensityWPerM2: untouched('powerDensityWPerM2')
      ? original!.powerDensityWPerM2
      : units.fromDisplay('powerPerFloorArea', Number(typed.powerDensityWPerM2)),
    hoursPerDayByMonth: typed.hoursPerDayByMonth.map(Number),
    heatToHouseFraction: untouched('heatToHouseFraction')
      ? original!.heatToHouseFraction
      : Number(typed.heatToHouseFraction) / 100,
  };
}

/** The editable part of a stored house. */
export function houseInputOf(house: House): HouseInput {
  const { id: _id, farmId: _farmId, version: _version, createdAt: _createdAt, updatedAt: _updatedAt, ...input } = house;
  return input;
}

/**
 * Server errors naming fields (400 details, 422 `field`) → Formik error paths. The API names
 * engine inputs `house.widthM`; the form's paths start at the house.
 */
export function apiErrorToFieldErrors(error: ApiError): Record<string, string> {
  const fieldErrors: Record<string, string> = {};
  const normalise = (field: string) => field.replace(/^house\./, '').replace(/\[(\d+)\]/g, '.$1');
  for (const detail of error.details) fieldErrors[normalise(detail.field)] = detail.message;
  if (error.field && !(normalise(error.field) in fieldErrors)) fieldErrors[normalise(error.field)] = error.message;
  return fieldErrors;
}

/** Floor area of the whole range, m². */
export function floorAreaM2(house: Pick<House, 'spans' | 'widthM' | 'lengthM'>): number {
  return house.spans * house.widthM * house.lengthM;
}

/** Sum of heater output (input × efficiency), W. */
export function heaterOutputW(house: Pick<House, 'heaters'>): number {
  return house.heaters.reduce((sum, heater) => sum + heater.count * heater.ratedInputW * heater.efficiency, 0);
}

import type { FarmRole, SiteRole } from '../common/permissions';
import type { HouseSpec } from '@thermbay/engine/house.types';
import type { PriceUnit } from '@thermbay/engine/season/fuel';
import type { ProductionPeriod } from '@thermbay/engine/season/production-calendar';

/**
 * The demo scenario. INVENTED for demonstration: the farm, its people and its houses do not
 * exist. The site is a real cold-winter place (central Minnesota) so the climate is plausible;
 * house sizes are common trade sizes (30 ft and 20 ft freestanding houses, a three-span range).
 */
export const DEMO_PASSWORD = 'thermbay-demo';

export interface DemoAccount {
  email: string;
  name: string;
  description: string;
  siteRole: SiteRole;
  farmRole: FarmRole | null;
}

export const DEMO_ACCOUNTS: DemoAccount[] = [
  {
    email: 'owner@example.com',
    name: 'Olive Owner',
    description: 'owns the demo farm',
    siteRole: 'user',
    farmRole: 'owner',
  },
  {
    email: 'grower@example.com',
    name: 'Gus Grower',
    description: 'grower: edits houses, runs estimates',
    siteRole: 'user',
    farmRole: 'grower',
  },
  {
    email: 'adviser@example.com',
    name: 'Ada Adviser',
    description: 'extension adviser: reads the farm, writes reports',
    siteRole: 'user',
    farmRole: 'adviser',
  },
  {
    email: 'admin@example.com',
    name: 'Andy Admin',
    description: 'site administrator: manages users',
    siteRole: 'admin',
    farmRole: null,
  },
];

export const DEMO_FARM = {
  name: 'Birch Hollow Growers (invented demo farm)',
  latitudeDeg: 45.56,
  longitudeDeg: -94.16,
  elevationM: 313,
  timeZone: 'America/Chicago',
};

/**
 * Demo climate for the invented farm: approximate central-Minnesota values recalled from memory
 * for the demo only (not a source for anything else). Replace with the farm's own national
 * climate normals and design temperatures in real use.
 */
export const DEMO_CLIMATE = {
  winterDesignC: -29,
  summerDesignC: 31,
  summerDesignWetBulbC: 22,
  summerDailyRangeK: 12,
  sourceNote: 'Invented demo values, roughly like central Minnesota normals (recalled, not from a table).',
  monthly: [
    [-18, -6],
    [-16, -3],
    [-9, 3],
    [-1, 12],
    [6, 20],
    [12, 25],
    [15, 28],
    [13, 26],
    [8, 21],
    [1, 13],
    [-7, 3],
    [-15, -5],
  ].map(([meanDailyMinC, meanDailyMaxC], index) => ({ month: index + 1, meanDailyMinC, meanDailyMaxC })),
};

const FT = 0.3048;
const BTU_PER_H_IN_W = 0.29307107;
const CFM_IN_M3_PER_S = 0.00047194745;

export interface DemoHouse extends HouseSpec {
  name: string;
  notes: string;
}

/**
 * No demo house carries a shade cloth (shadeCloth left out, stored as null): the invented farm has
 * a central-Minnesota summer (31 °C design day), and none of the three houses is described as a
 * shaded crop, so none plainly would use one. Add one in the house form to see its effect.
 */
export const DEMO_HOUSES: DemoHouse[] = [
  {
    name: 'House A – tomatoes',
    notes: 'Invented demo house: 30 × 96 ft gothic arch, double poly with IR inner film, two propane unit heaters.',
    shape: 'gothic-arch',
    spans: 1,
    widthM: round(30 * FT),
    lengthM: round(96 * FT),
    eaveHeightM: round(8 * FT),
    ridgeHeightM: round(17 * FT),
    coverings: { roof: 'poly-double-ir-inner', sidewalls: 'poly-double-ir-inner', endwalls: 'polycarbonate-twin-8mm' },
    coveringUOverridesWPerM2K: {},
    airLeakageClassId: 'new-film-double',
    airChangesPerHourOverride: null,
    perimeterInsulated: true,
    curtainId: null,
    heaters: [{ count: 2, ratedInputW: round(250_000 * BTU_PER_H_IN_W, 2), efficiency: 0.8, fuelId: 'propane' }],
    exhaustFans: { count: 2, capacityEachM3PerS: round(12_000 * CFM_IN_M3_PER_S) },
    inletAreaM2: 4.5,
    setpoints: { dayHeatingC: 20, nightHeatingC: 17, coolingC: 26 },
  },
  {
    name: 'House B – bedding plants',
    notes: 'Invented demo house: 20 × 96 ft quonset, single poly, a single natural-gas heater and one small fan.',
    shape: 'quonset',
    spans: 1,
    widthM: round(20 * FT),
    lengthM: round(96 * FT),
    eaveHeightM: round(4 * FT),
    ridgeHeightM: round(11 * FT),
    coverings: { roof: 'poly-single', sidewalls: 'poly-single', endwalls: 'poly-single' },
    coveringUOverridesWPerM2K: {},
    airLeakageClassId: 'new-film-single',
    airChangesPerHourOverride: null,
    perimeterInsulated: false,
    curtainId: null,
    heaters: [{ count: 1, ratedInputW: round(300_000 * BTU_PER_H_IN_W, 2), efficiency: 0.8, fuelId: 'natural-gas' }],
    exhaustFans: { count: 1, capacityEachM3PerS: round(8_000 * CFM_IN_M3_PER_S) },
    inletAreaM2: 1.2,
    setpoints: { dayHeatingC: 15, nightHeatingC: 10, coolingC: 24 },
  },
  {
    name: 'Range C – cucumbers',
    notes:
      'Invented demo range: three 30 × 150 ft gable spans, gutter-connected, double poly roof, twin-wall sides above a 2 ft concrete-block kneewall, energy curtain.',
    shape: 'gable',
    spans: 3,
    widthM: round(30 * FT),
    lengthM: round(150 * FT),
    eaveHeightM: round(12 * FT),
    ridgeHeightM: round(19 * FT),
    coverings: {
      roof: 'poly-double-inflated',
      sidewalls: 'polycarbonate-twin-8mm',
      endwalls: 'polycarbonate-twin-8mm',
    },
    coveringUOverridesWPerM2K: {},
    airLeakageClassId: 'new-film-double',
    airChangesPerHourOverride: null,
    perimeterInsulated: true,
    curtainId: 'energy-screen-aluminised',
    kneewallHeightM: round(2 * FT),
    kneewallId: 'concrete-block-200mm',
    heaters: [{ count: 6, ratedInputW: round(400_000 * BTU_PER_H_IN_W, 2), efficiency: 0.8, fuelId: 'natural-gas' }],
    exhaustFans: { count: 10, capacityEachM3PerS: round(20_000 * CFM_IN_M3_PER_S) },
    inletAreaM2: 20,
    setpoints: { dayHeatingC: 21, nightHeatingC: 18, coolingC: 27 },
  },
];

function round(value: number, digits = 3): number {
  const f = 10 ** digits;
  return Math.round(value * f) / f;
}

/**
 * Demo fuel prices: INVENTED round numbers for the demo only, not market data. Each row says so in
 * its note, which the app shows beside the price.
 */
export const DEMO_FUEL_PRICES: Array<{ fuelId: string; pricePerUnit: number; priceUnit: PriceUnit; note: string }> = [
  { fuelId: 'propane', pricePerUnit: 1.6, priceUnit: 'us', note: 'Invented demo price per US gal, not market data' },
  { fuelId: 'natural-gas', pricePerUnit: 0.8, priceUnit: 'us', note: 'Invented demo price per therm, not market data' },
  { fuelId: 'electricity', pricePerUnit: 0.12, priceUnit: 'si', note: 'Invented demo price per kWh, not market data' },
];

/**
 * Demo production calendars (INVENTED), by house name. House A grows a fall and a spring tomato
 * crop with a winter clean-out; House B is heated for spring bedding plants only; Range C has no
 * calendar and is heated all season.
 */
export const DEMO_CALENDARS: Record<string, Array<ProductionPeriod & { label: string }>> = {
  'House A – tomatoes': [
    { startMonthDay: '09-01', endMonthDay: '11-30', mode: 'heated', nightHeatingC: 16, label: 'Fall tomato crop' },
    { startMonthDay: '12-01', endMonthDay: '01-14', mode: 'empty', label: 'Clean-out' },
    { startMonthDay: '01-15', endMonthDay: '08-31', mode: 'heated', label: 'Spring tomato crop' },
  ],
  'House B – bedding plants': [
    { startMonthDay: '02-15', endMonthDay: '05-31', mode: 'heated', label: 'Spring bedding plants' },
  ],
};

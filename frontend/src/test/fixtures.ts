import type { House, ReferenceData } from '../api/types';

/** Small reference tables shaped like GET /api/reference-data (labels only matter here). */
export const referenceDataFixture: ReferenceData = {
  coverings: {
    title: 'Coverings',
    description: 'test rows',
    rows: [
      {
        id: 'poly-double-inflated',
        label: 'Inflated double polyethylene',
        uWPerM2K: 4,
        source: 'test',
        confidence: 'memory',
      },
      { id: 'glass-single', label: 'Single glass', uWPerM2K: 6.2, source: 'test', confidence: 'memory' },
    ],
  },
  'air-leakage': {
    title: 'Air leakage',
    description: 'test rows',
    rows: [
      {
        id: 'new-tight',
        label: 'New, tight construction',
        airChangesPerHour: 0.75,
        source: 'test',
        confidence: 'memory',
      },
    ],
  },
  curtains: {
    title: 'Curtains',
    description: 'test rows',
    rows: [{ id: 'energy-screen', label: 'Energy screen', source: 'test', confidence: 'memory' }],
  },
  'shade-cloths': {
    title: 'Shade cloths',
    description: 'test rows',
    rows: [
      { id: 'shade-30', label: '30 % shade cloth', solarTransmittance: 0.7, source: 'test', confidence: 'memory' },
      { id: 'shade-50', label: '50 % shade cloth', solarTransmittance: 0.5, source: 'test', confidence: 'memory' },
    ],
  },
  lamps: {
    title: 'Lamps',
    description: 'test rows',
    rows: [
      {
        id: 'hps-double-ended',
        kind: 'lamp-type',
        label: 'HPS',
        heatToHouseFraction: 0.93,
        typicalPowerDensityWPerM2: 70,
        source: 'test',
        confidence: 'memory',
      },
      {
        id: 'led-horticultural',
        kind: 'lamp-type',
        label: 'LED',
        heatToHouseFraction: 0.95,
        typicalPowerDensityWPerM2: 45,
        source: 'test',
        confidence: 'memory',
      },
      { id: 'heat-to-house-default', kind: 'method', heatToHouseFraction: 0.95, source: 'test', confidence: 'memory' },
      {
        id: 'starting-schedule',
        kind: 'method',
        hoursPerDayByMonth: [12, 12, 10, 8, 4, 0, 0, 0, 4, 8, 10, 12],
        source: 'test',
        confidence: 'common-practice',
      },
    ],
  },
  fuels: {
    title: 'Fuels',
    description: 'test rows',
    rows: [{ id: 'natural-gas', label: 'Natural gas', source: 'test', confidence: 'derived' }],
  },
};

export const houseFixture: House = {
  id: 7,
  farmId: 3,
  name: 'Range A',
  notes: null,
  shape: 'gable',
  spans: 1,
  widthM: 9.144,
  lengthM: 29.2608,
  eaveHeightM: 2.4384,
  ridgeHeightM: 4.2672,
  coverings: { roof: 'poly-double-inflated', sidewalls: 'poly-double-inflated', endwalls: 'glass-single' },
  coveringUOverridesWPerM2K: {},
  airLeakageClassId: 'new-tight',
  airChangesPerHourOverride: null,
  perimeterInsulated: false,
  curtainId: null,
  kneewallHeightM: null,
  kneewallId: null,
  shadeCloth: null,
  heaters: [{ count: 2, ratedInputW: 73_267.77, efficiency: 0.8, fuelId: 'natural-gas', heaterType: null }],
  exhaustFans: { count: 2, capacityEachM3PerS: 4.719474432 },
  inletAreaM2: 2.4,
  setpoints: { dayHeatingC: 18, nightHeatingC: 15.5, coolingC: 26 },
  lamps: null,
  createdAt: '2026-11-01T00:00:00.000Z',
  version: 1,
  updatedAt: '2026-11-01T00:00:00.000Z',
};

/** The words for a house's form that the engine, the API and the UI share. */
export type HouseShape = 'gable' | 'gothic-arch' | 'quonset';
export const HOUSE_SHAPES: readonly HouseShape[] = ['gable', 'gothic-arch', 'quonset'];

export type SurfaceGroup = 'roof' | 'sidewalls' | 'endwalls';
export const SURFACE_GROUPS: readonly SurfaceGroup[] = ['roof', 'sidewalls', 'endwalls'];

/**
 * What kind of heater a heater group is; each has one row in reference-data/heater-types.json
 * (its typical efficiency and whether it burns fuel and vents outside).
 */
export type HeaterType =
  'gravity-vented' | 'power-vented' | 'separated-combustion' | 'condensing' | 'unvented' | 'boiler' | 'electric';
export const HEATER_TYPES: readonly HeaterType[] = [
  'gravity-vented',
  'power-vented',
  'separated-combustion',
  'condensing',
  'unvented',
  'boiler',
  'electric',
];

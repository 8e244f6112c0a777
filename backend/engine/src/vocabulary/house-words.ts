/** The words for a house's form that the engine, the API and the UI share. */
export type HouseShape = 'gable' | 'gothic-arch' | 'quonset';
export const HOUSE_SHAPES: readonly HouseShape[] = ['gable', 'gothic-arch', 'quonset'];

export type SurfaceGroup = 'roof' | 'sidewalls' | 'endwalls';
export const SURFACE_GROUPS: readonly SurfaceGroup[] = ['roof', 'sidewalls', 'endwalls'];

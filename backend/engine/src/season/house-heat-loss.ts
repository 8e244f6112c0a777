import { EngineInputError } from '../errors';
import type { HouseSpec } from '../house.types';
import { referenceRow, type ReferenceData, type ReferenceRow } from '../reference-data.types';
import { computeHouseGeometry, opaqueEnvelopeShare, type HouseGeometry } from '../geometry/house-geometry';
import { heatLossCoefficients, heatLossComponentLabels, type HeatLossCoefficients } from '../heating/heat-loss';
import { skyConstants, skyCoupling, type SkyCoupling } from '../heating/sky-radiation';
import type { SurfaceGroup } from '../vocabulary';
import { dryAirDensityKgPerM3, standardAtmosphericPressurePa } from '../psychrometrics';

export interface CoveringLightRow extends ReferenceRow {
  lightTransmittance: number;
  lightSource?: string;
  lightConfidence?: ReferenceRow['confidence'];
  irSource?: string;
  irConfidence?: ReferenceRow['confidence'];
}

/** The parts of a house's heat-loss coefficient (the design night's components but the sky), W/K. */
export type EnvelopePartKey = SurfaceGroup | 'kneewall' | 'perimeter' | 'infiltration';
export type EnvelopeParts = Record<EnvelopePartKey, number>;

/** The parts of UA from the heat-loss coefficients; they add up to `totalWPerK`. */
export function envelopeParts(coefficients: HeatLossCoefficients): EnvelopeParts {
  return {
    ...coefficients.coveringWPerK,
    kneewall: coefficients.kneewallWPerK,
    perimeter: coefficients.perimeterWPerK,
    infiltration: coefficients.infiltrationWPerK,
  };
}

/** What the season needs from a house: its heat-loss coefficients by day and night and its roof's light. */
export interface HouseThermal {
  geometry: HouseGeometry;
  /** UA with the curtain open (or no curtain), W/K */
  uaOpenWPerK: number;
  /** UA with the curtain drawn (equal to uaOpenWPerK without a curtain), W/K */
  uaClosedWPerK: number;
  /** the parts of uaOpenWPerK and of uaClosedWPerK, W/K */
  partsOpenWPerK: EnvelopeParts;
  partsClosedWPerK: EnvelopeParts;
  /** coupling to the night sky, curtain open and drawn (heating/sky-radiation.ts) */
  skyOpen: SkyCoupling;
  skyClosed: SkyCoupling;
  /** labels of the parts, e.g. 'Roof (Inflated double polyethylene)' */
  partLabels: Partial<Record<EnvelopePartKey, string>>;
  /** air density used for infiltration, kg/m³ */
  airDensityKgPerM3: number;
  roofCovering: CoveringLightRow;
  /**
   * light reaching the crop ÷ light through the roof covering alone: 1 − the opaque kneewall's
   * share of the envelope (1 without a kneewall)
   */
  envelopeLightFactor: number;
}

export function coveringLightRow(ref: ReferenceData, coveringId: string, field: string): CoveringLightRow {
  const row = referenceRow<CoveringLightRow>(ref, 'coverings', coveringId);
  if (!row) throw new EngineInputError(field, `unknown covering '${coveringId}'`);
  if (typeof row.lightTransmittance !== 'number') {
    throw new Error(`reference-data/coverings.json row ${coveringId} has no lightTransmittance`);
  }
  return row;
}

/**
 * Heat-loss coefficients of a house at a site's elevation. Infiltration uses the density of dry
 * air at the night setpoint and the standard-atmosphere pressure of the elevation: the season
 * spans many temperatures and humidities, and the difference to moist air is about 1 %.
 */
export function houseThermal(house: HouseSpec, elevationM: number, ref: ReferenceData): HouseThermal {
  const geometry = computeHouseGeometry(house);
  const airDensityKgPerM3 = dryAirDensityKgPerM3(
    house.setpoints.nightHeatingC,
    standardAtmosphericPressurePa(elevationM),
  );
  const open = heatLossCoefficients(house, geometry, ref, { curtainClosed: false, airDensityKgPerM3 });
  const closed = house.curtainId
    ? heatLossCoefficients(house, geometry, ref, { curtainClosed: true, airDensityKgPerM3 })
    : open;
  const sky = skyConstants(ref);
  const skyOpen = skyCoupling(open, geometry.floorAreaM2, sky);
  return {
    geometry,
    uaOpenWPerK: open.totalWPerK,
    uaClosedWPerK: closed.totalWPerK,
    partsOpenWPerK: envelopeParts(open),
    partsClosedWPerK: envelopeParts(closed),
    skyOpen,
    skyClosed: closed === open ? skyOpen : skyCoupling(closed, geometry.floorAreaM2, sky),
    partLabels: heatLossComponentLabels(open),
    airDensityKgPerM3,
    roofCovering: coveringLightRow(ref, house.coverings.roof, 'house.coverings.roof'),
    envelopeLightFactor: 1 - opaqueEnvelopeShare(geometry),
  };
}

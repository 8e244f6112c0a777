import { BOUNDS } from '../vocabulary';
import { EngineInputError, requireInRange } from '../errors';
import { HOUSE_SHAPES, type HouseShape } from '../vocabulary';
import { type HouseSpec } from '../house.types';

/**
 * Surface areas and volume of a freestanding or gutter-connected house.
 *
 * Every span has the same cross-section: a rectangle up to the eave (gutter) height plus a roof
 * profile above it with rise = ridgeHeightM − eaveHeightM:
 * - gable: two straight slopes meeting at the ridge;
 * - quonset: one circular arc through both eaves and the ridge (a circular segment of chord
 *   widthM and rise r). A true semicircular hoop is the case r = widthM / 2; a rise above that
 *   would bulge outside the walls, so it is refused;
 * - gothic arch: two circular arcs, one per side, each running from its eave to the ridge, where
 *   they meet at a point. Each arc's centre lies on the vertical line through the OPPOSITE
 *   sidewall (on the perpendicular bisector of the eave–ridge chord). This generalises the
 *   classic equilateral pointed arch (radius = span, centres at the opposite springing points,
 *   rise = width·√3/2) to lower rises, and gives arcs that are steeper at the eave than at the
 *   ridge. A rise above width·√3/2 would lift the centre above the eave line and bulge the arc
 *   outside the walls, so it is refused (the equilateral arch is the tallest such profile).
 *
 * Only the two outer long walls of a range are sidewalls (inner spans share gutters); every span
 * has an endwall at each end.
 *
 * An opaque kneewall (a construction named in `kneewallId`, `kneewallHeightM` high) runs along the
 * foot of both sidewalls and of every endwall: its area (height × (2 × length + 2 × spans × width))
 * leaves the sidewall and endwall areas, which are the glazed areas.
 */
export interface HouseGeometry {
  floorAreaM2: number;
  roofAreaM2: number;
  /** glazed area of the two outer long walls: (eave height − kneewall height) × length each */
  sidewallAreaM2: number;
  /** glazed area of both ends of every span: rectangle up to the eave plus the roof profile, less the kneewall */
  endwallAreaM2: number;
  /** opaque kneewall on the sidewalls and endwalls, m² (0 without one) */
  kneewallAreaM2: number;
  /** height of the opaque kneewall, m (0 without one) */
  kneewallHeightM: number;
  /** whole envelope above ground: roof + glazed walls + kneewall */
  coverAreaM2: number;
  perimeterM: number;
  volumeM3: number;
  /** length of the roof profile of one span, eave to eave, m */
  roofArcLengthM: number;
  /** ridge height minus eave height, m */
  roofRiseM: number;
  /** area of one span's end above the eave line, m² */
  roofProfileAreaM2: number;
  /** area of one endwall of one span (rectangle + roof profile), m² */
  endwallAreaPerSpanEndM2: number;
}

export interface RoofProfile {
  /** eave-to-eave length of the roof profile, m */
  arcLengthM: number;
  /** area between the profile and the eave line, m² */
  areaAboveEaveM2: number;
}

/** Gable: two straight slopes (Pythagoras). */
export function gableProfile(widthM: number, riseM: number): RoofProfile {
  const slopeLengthM = Math.hypot(widthM / 2, riseM);
  return { arcLengthM: 2 * slopeLengthM, areaAboveEaveM2: (widthM * riseM) / 2 };
}

/**
 * Quonset: a circular segment with chord `widthM` and rise `riseM` (riseM ≤ widthM / 2).
 * Half-angle θ satisfies tan(θ/2) = rise / (chord/2); radius R = ((w/2)² + r²) / (2r).
 * Arc = 2Rθ; segment area = R²(2θ − sin 2θ) / 2.
 */
export function quonsetProfile(widthM: number, riseM: number): RoofProfile {
  const halfChordM = widthM / 2;
  const halfAngleRad = 2 * Math.atan(riseM / halfChordM);
  const radiusM = (halfChordM * halfChordM + riseM * riseM) / (2 * riseM);
  return {
    arcLengthM: 2 * radiusM * halfAngleRad,
    areaAboveEaveM2: (radiusM * radiusM * (2 * halfAngleRad - Math.sin(2 * halfAngleRad))) / 2,
  };
}

/**
 * Gothic arch: two circular arcs meeting at the ridge, each centred on the vertical line through
 * the opposite sidewall. With the left eave at (0, 0) and ridge at (w/2, r), the centre is where
 * the perpendicular bisector of the eave–ridge chord meets x = w:
 *   centre = (w, r/2 − 3w²/(8r)).
 * Area of one half above the eave line = triangle under the chord (w·r/4) + circular segment
 * between chord and arc (R²(φ − sin φ)/2), φ the angle the arc subtends at its centre.
 */
export function gothicArchProfile(widthM: number, riseM: number): RoofProfile {
  const centreX = widthM;
  const centreY = riseM / 2 - (3 * widthM * widthM) / (8 * riseM);
  const toEave = { x: 0 - centreX, y: 0 - centreY };
  const toRidge = { x: widthM / 2 - centreX, y: riseM - centreY };
  const radiusM = Math.hypot(toEave.x, toEave.y);
  const cross = toEave.x * toRidge.y - toEave.y * toRidge.x;
  const dot = toEave.x * toRidge.x + toEave.y * toRidge.y;
  const subtendedRad = Math.abs(Math.atan2(cross, dot));
  const halfAreaM2 = (widthM * riseM) / 4 + (radiusM * radiusM * (subtendedRad - Math.sin(subtendedRad))) / 2;
  return { arcLengthM: 2 * radiusM * subtendedRad, areaAboveEaveM2: 2 * halfAreaM2 };
}

/** Tallest gothic rise the construction allows without bulging outside the walls (equilateral arch). */
export function gothicArchMaxRiseM(widthM: number): number {
  return (widthM * Math.sqrt(3)) / 2;
}

export function roofProfile(shape: HouseShape, widthM: number, riseM: number): RoofProfile {
  switch (shape) {
    case 'gable':
      return gableProfile(widthM, riseM);
    case 'quonset':
      return quonsetProfile(widthM, riseM);
    case 'gothic-arch':
      return gothicArchProfile(widthM, riseM);
  }
}

/** Checks the dimensions the geometry needs; throws EngineInputError naming the field. */
export function validateHouseDimensions(house: HouseSpec, fieldPrefix = 'house'): void {
  if (!house || typeof house !== 'object') {
    throw new EngineInputError(fieldPrefix, `${fieldPrefix} is required`);
  }
  if (!HOUSE_SHAPES.includes(house.shape)) {
    throw new EngineInputError(
      `${fieldPrefix}.shape`,
      `${fieldPrefix}.shape must be one of ${HOUSE_SHAPES.join(', ')}`,
    );
  }
  requireInRange(`${fieldPrefix}.spans`, house.spans, BOUNDS.spans.min, BOUNDS.spans.max);
  if (!Number.isInteger(house.spans)) {
    throw new EngineInputError(`${fieldPrefix}.spans`, `${fieldPrefix}.spans must be a whole number`);
  }
  requireInRange(`${fieldPrefix}.widthM`, house.widthM, BOUNDS.widthM.min, BOUNDS.widthM.max);
  requireInRange(`${fieldPrefix}.lengthM`, house.lengthM, BOUNDS.lengthM.min, BOUNDS.lengthM.max);
  requireInRange(`${fieldPrefix}.eaveHeightM`, house.eaveHeightM, BOUNDS.eaveHeightM.min, BOUNDS.eaveHeightM.max);
  requireInRange(`${fieldPrefix}.ridgeHeightM`, house.ridgeHeightM, BOUNDS.ridgeHeightM.min, BOUNDS.ridgeHeightM.max);
  if (house.ridgeHeightM <= house.eaveHeightM) {
    throw new EngineInputError(
      `${fieldPrefix}.ridgeHeightM`,
      `${fieldPrefix}.ridgeHeightM must exceed ${fieldPrefix}.eaveHeightM`,
    );
  }
  const riseM = house.ridgeHeightM - house.eaveHeightM;
  if (house.shape === 'quonset' && riseM > house.widthM / 2 + 1e-9) {
    throw new EngineInputError(
      `${fieldPrefix}.ridgeHeightM`,
      `a quonset's ridge can rise at most half the span width (${(house.widthM / 2).toFixed(2)} m) above the eave`,
    );
  }
  const maxGothicRiseM = gothicArchMaxRiseM(house.widthM);
  if (house.shape === 'gothic-arch' && riseM > maxGothicRiseM + 1e-9) {
    throw new EngineInputError(
      `${fieldPrefix}.ridgeHeightM`,
      `a gothic arch's ridge can rise at most ${maxGothicRiseM.toFixed(2)} m (width × √3/2) above the eave`,
    );
  }
  opaqueKneewallHeightM(house, fieldPrefix);
}

/** Height of the house's opaque kneewall, m: 0 unless a construction is named. Checks the height. */
export function opaqueKneewallHeightM(house: HouseSpec, fieldPrefix = 'house'): number {
  const height = house.kneewallHeightM;
  if (height !== undefined && height !== null) {
    requireInRange(`${fieldPrefix}.kneewallHeightM`, height, BOUNDS.kneewallHeightM.min, BOUNDS.kneewallHeightM.max);
    if (height > house.eaveHeightM) {
      throw new EngineInputError(
        `${fieldPrefix}.kneewallHeightM`,
        `${fieldPrefix}.kneewallHeightM cannot exceed the eave height (${house.eaveHeightM} m)`,
      );
    }
  }
  const hasConstruction = typeof house.kneewallId === 'string' && house.kneewallId !== '';
  return hasConstruction ? (height ?? 0) : 0;
}

/** Share of the envelope (roof, walls and kneewall) that the opaque kneewall takes: it passes no light. */
export function opaqueEnvelopeShare(geometry: HouseGeometry): number {
  return geometry.coverAreaM2 > 0 ? geometry.kneewallAreaM2 / geometry.coverAreaM2 : 0;
}

export function computeHouseGeometry(house: HouseSpec): HouseGeometry {
  validateHouseDimensions(house);
  const kneewallHeightM = opaqueKneewallHeightM(house);
  const { spans, widthM, lengthM, eaveHeightM } = house;
  const roofRiseM = house.ridgeHeightM - eaveHeightM;
  const profile = roofProfile(house.shape, widthM, roofRiseM);

  const endwallAreaPerSpanEndM2 = widthM * eaveHeightM + profile.areaAboveEaveM2;
  const floorAreaM2 = spans * widthM * lengthM;
  const roofAreaM2 = spans * profile.arcLengthM * lengthM;
  const kneewallSidewallM2 = 2 * kneewallHeightM * lengthM;
  const kneewallEndwallM2 = 2 * spans * widthM * kneewallHeightM;
  const sidewallAreaM2 = 2 * eaveHeightM * lengthM - kneewallSidewallM2;
  const endwallAreaM2 = 2 * spans * endwallAreaPerSpanEndM2 - kneewallEndwallM2;
  const kneewallAreaM2 = kneewallSidewallM2 + kneewallEndwallM2;

  return {
    floorAreaM2,
    roofAreaM2,
    sidewallAreaM2,
    endwallAreaM2,
    kneewallAreaM2,
    kneewallHeightM,
    coverAreaM2: roofAreaM2 + sidewallAreaM2 + endwallAreaM2 + kneewallAreaM2,
    perimeterM: 2 * (spans * widthM + lengthM),
    volumeM3: spans * endwallAreaPerSpanEndM2 * lengthM,
    roofArcLengthM: profile.arcLengthM,
    roofRiseM,
    roofProfileAreaM2: profile.areaAboveEaveM2,
    endwallAreaPerSpanEndM2,
  };
}

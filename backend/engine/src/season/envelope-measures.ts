import { EngineInputError, requireInRange } from '../errors';
import { BOUNDS, quantityToken, type SurfaceGroup } from '../vocabulary';
import type { HouseSpec } from '../house.types';
import { referenceRow, type ReferenceData, type ReferenceRow } from '../reference-data.types';
import { coveringLightRow, type CoveringLightRow } from './house-heat-loss';
import { computeHouseGeometry, opaqueEnvelopeShare } from '../geometry/house-geometry';
import { chosenRow, type KneewallRow } from '../heating/heating-reference';
import { measureDefaults, notApplicable, percent, type MeasureContext, type PreparedMeasure } from './measure-plan';
import type { LightChange, Measure } from './measure-types';

/** Measures that change the house's envelope: a second layer, a curtain, perimeter insulation, sealing. */

interface CoveringURow extends ReferenceRow {
  uWPerM2K: number;
}
interface CurtainRow extends ReferenceRow {
  uReduction: number;
}
interface AirLeakageRow extends ReferenceRow {
  airChangesPerHour: number;
}

/** U of a house's covering on a surface: its override where given, else the reference value. */
function presentCoveringU(house: HouseSpec, surface: SurfaceGroup, ref: ReferenceData): number {
  const override = house.coveringUOverridesWPerM2K?.[surface];
  if (typeof override === 'number') return override;
  const row = referenceRow<CoveringURow>(ref, 'coverings', house.coverings[surface]);
  if (!row) throw new EngineInputError(`house.coverings.${surface}`, `unknown covering '${house.coverings[surface]}'`);
  return row.uWPerM2K;
}

/** Air changes per hour of the house as it is: the measured override, else its leakage class. */
function presentAirChangesPerHour(house: HouseSpec, ref: ReferenceData): number {
  if (typeof house.airChangesPerHourOverride === 'number') return house.airChangesPerHourOverride;
  const row = referenceRow<AirLeakageRow>(ref, 'air-leakage', house.airLeakageClassId);
  if (!row)
    throw new EngineInputError('house.airLeakageClassId', `unknown air-leakage class '${house.airLeakageClassId}'`);
  return row.airChangesPerHour;
}

export function planSecondLayer(
  measure: Extract<Measure, { kind: 'second-poly-layer' }>,
  context: MeasureContext,
): PreparedMeasure {
  const { field, base, house, ref, withHouse } = context;
  const defaults = measureDefaults(ref, 'second-poly-layer');
  const coveringId = measure.coveringId ?? defaults.targetCoveringId!;
  const surfaces = measure.surfaces ?? defaults.surfaces ?? ['roof', 'sidewalls'];
  if (!Array.isArray(surfaces) || surfaces.length === 0 || surfaces.some((s) => s !== 'roof' && s !== 'sidewalls')) {
    throw new EngineInputError(`${field}.surfaces`, "surfaces must list 'roof' and/or 'sidewalls'");
  }
  const after = coveringLightRow(ref, coveringId, `${field}.coveringId`) as CoveringLightRow & Partial<CoveringURow>;
  if (typeof after.uWPerM2K !== 'number')
    throw new Error(`reference-data/coverings.json row ${coveringId} has no uWPerM2K`);
  const targetU = after.uWPerM2K;
  const afterLabel = after.label ?? after.id;
  // Only where the new covering loses less heat than the surface as it is.
  const improved = surfaces.filter((surface) => targetU < presentCoveringU(house, surface, ref));
  const skipped = surfaces.filter((surface) => !improved.includes(surface));
  if (improved.length === 0) {
    const present = surfaces
      .map((surface) => `${surface} ${quantityToken('uValue', presentCoveringU(house, surface, ref))}`)
      .join(', ');
    return notApplicable(
      base,
      `${surfaces.join(' and ')} covered with ${afterLabel}`,
      `The ${surfaces.join(' and ')} already ${surfaces.length === 1 ? 'loses' : 'lose'} as little heat as ${afterLabel} or less (U now: ${present}; ${afterLabel}: ${quantityToken('uValue', targetU)}).`,
    );
  }
  const coverings = { ...house.coverings };
  const overrides = { ...(house.coveringUOverridesWPerM2K ?? {}) };
  for (const surface of improved) {
    coverings[surface] = coveringId;
    delete overrides[surface];
  }
  const lightSurface = improved.includes('roof') ? 'roof' : 'sidewalls';
  const before = coveringLightRow(ref, house.coverings[lightSurface], `house.coverings.${lightSurface}`);
  const notes: string[] = [];
  if (improved.includes('roof'))
    notes.push(
      'Less light through the roof also means less free solar heat; the saving shown already accounts for it.',
    );
  if (skipped.length > 0)
    notes.push(`The ${skipped.join(' and ')} already loses as little heat or less, so it is left as it is.`);
  return {
    variant: withHouse({ coverings, coveringUOverridesWPerM2K: overrides }),
    options: {},
    description: `${improved.join(' and ')} covered with ${afterLabel}`,
    lightChange: {
      surface: lightSurface,
      before: before.lightTransmittance,
      after: after.lightTransmittance,
      relativeChange: after.lightTransmittance / before.lightTransmittance - 1,
      source: after.lightSource ?? after.source,
    },
    notes,
    notApplicableReason: null,
  };
}

export function planCurtain(
  measure: Extract<Measure, { kind: 'thermal-curtain' }>,
  context: MeasureContext,
): PreparedMeasure {
  const { field, base, house, ref, withHouse } = context;
  const defaults = measureDefaults(ref, 'thermal-curtain');
  const curtainId = measure.curtainId ?? defaults.defaultCurtainId!;
  const curtain = referenceRow<CurtainRow>(ref, 'curtains', curtainId);
  if (!curtain) throw new EngineInputError(`${field}.curtainId`, `unknown curtain '${curtainId}'`);
  const description = `${curtain.label ?? curtainId} drawn from sunset to sunrise`;
  const present = house.curtainId ? referenceRow<CurtainRow>(ref, 'curtains', house.curtainId) : null;
  if (present && present.uReduction >= curtain.uReduction) {
    return notApplicable(
      base,
      description,
      present.id === curtain.id
        ? `The house already has this curtain (${present.label ?? present.id}).`
        : `The house already has a curtain (${present.label ?? present.id}) that saves as much as ${curtain.label ?? curtainId} or more (${percent(present.uReduction)} against ${percent(curtain.uReduction)} less loss through roof and sidewalls).`,
    );
  }
  const shade = measureDefaults(ref, 'curtain-stowed-shade');
  const roof = coveringLightRow(ref, house.coverings.roof, 'house.coverings.roof');
  // A curtain already there already shades by day; a replacement adds no daytime shade.
  const shadeFraction = present ? 0 : (shade.shadeFraction ?? 0);
  return {
    variant: withHouse({ curtainId }),
    options: {},
    description,
    lightChange: {
      surface: 'roof',
      before: roof.lightTransmittance,
      after: roof.lightTransmittance * (1 - shadeFraction),
      relativeChange: -shadeFraction,
      source: shade.source,
    },
    notes: present ? [`Replaces the existing curtain (${present.label ?? present.id}).`] : [],
    notApplicableReason: null,
  };
}

/**
 * Insulate the edge and the kneewall: the perimeter takes the insulated factor, and the kneewall
 * is built of the target board (2 in foam by default) at the house's kneewall height, or at the
 * default height where the house gives none. Where that band was glazing it now passes no light.
 */
export function planPerimeterInsulation(
  measure: Extract<Measure, { kind: 'perimeter-insulation' }>,
  context: MeasureContext,
): PreparedMeasure {
  const { field, base, house, ref, withHouse } = context;
  const defaults = measureDefaults(ref, 'perimeter-insulation');
  const targetId = measure.kneewallId ?? defaults.targetKneewallId;
  if (!targetId) throw new Error('reference-data/measures.json perimeter-insulation needs a targetKneewallId');
  const target = chosenRow<KneewallRow>(ref, 'kneewalls', targetId, `${field}.kneewallId`);
  const houseHeightM =
    typeof house.kneewallHeightM === 'number' && house.kneewallHeightM > 0 ? house.kneewallHeightM : null;
  const heightM = requireInRange(
    `${field}.kneewallHeightM`,
    houseHeightM ?? measure.kneewallHeightM ?? defaults.defaultKneewallHeightM,
    BOUNDS.kneewallHeightM.min,
    Math.min(BOUNDS.kneewallHeightM.max, house.eaveHeightM),
  );
  const present = house.kneewallId
    ? chosenRow<KneewallRow>(ref, 'kneewalls', house.kneewallId, 'house.kneewallId')
    : null;
  const kneewallBetter = !present || target.uWPerM2K < present.uWPerM2K || presentHeight(house) < heightM;
  const description = `perimeter insulated and kneewall of ${target.label} (${quantityToken('length', heightM)} high)`;
  if (house.perimeterInsulated && !kneewallBetter) {
    return notApplicable(
      base,
      description,
      `The perimeter is already insulated and the kneewall (${present!.label}) loses as little heat as ${target.label} or less.`,
    );
  }
  const changed: Partial<HouseSpec> = { perimeterInsulated: true };
  if (kneewallBetter) Object.assign(changed, { kneewallId: target.id, kneewallHeightM: heightM });
  const variant = withHouse(changed);
  const notes: string[] = [];
  let lightChange: LightChange | null = null;
  const beforeFactor = 1 - opaqueEnvelopeShare(computeHouseGeometry(house));
  const afterFactor = 1 - opaqueEnvelopeShare(computeHouseGeometry(variant.house));
  if (afterFactor < beforeFactor - 1e-12) {
    const roof = coveringLightRow(ref, house.coverings.roof, 'house.coverings.roof');
    lightChange = {
      surface: 'kneewall',
      before: roof.lightTransmittance * beforeFactor,
      after: roof.lightTransmittance * afterFactor,
      relativeChange: afterFactor / beforeFactor - 1,
      source:
        "the opaque kneewall's share of the envelope area (method: light taken to enter in proportion to glazed area)",
    };
    notes.push(
      'The glazed band at the foot of the walls becomes opaque: less light and less free solar heat there; the saving shown already accounts for it.',
    );
  }
  if (present && kneewallBetter) notes.push(`Replaces the kneewall of ${present.label}.`);
  if (!kneewallBetter)
    notes.push(`The kneewall (${present!.label}) already loses as little heat; only the edge is insulated.`);
  return { variant, options: {}, description, lightChange, notes, notApplicableReason: null };
}

/** Height of the house's opaque kneewall, m (0 without a construction). */
function presentHeight(house: HouseSpec): number {
  return house.kneewallId && typeof house.kneewallHeightM === 'number' ? house.kneewallHeightM : 0;
}

export function planSealing(measure: Extract<Measure, { kind: 'sealing' }>, context: MeasureContext): PreparedMeasure {
  const { field, base, house, ref, withHouse } = context;
  const defaults = measureDefaults(ref, 'sealing');
  const presentAch = presentAirChangesPerHour(house, ref);
  let targetAch: number;
  let description: string;
  let changed: Partial<HouseSpec>;
  if (measure.airChangesPerHour !== undefined && measure.airChangesPerHour !== null) {
    targetAch = requireInRange(
      `${field}.airChangesPerHour`,
      measure.airChangesPerHour,
      BOUNDS.airChangesPerHour.min,
      BOUNDS.airChangesPerHour.max,
    );
    description = `air leakage cut to ${targetAch} air changes per hour`;
    changed = { airChangesPerHourOverride: targetAch };
  } else {
    const classId = measure.airLeakageClassId ?? defaults.defaultAirLeakageClassId!;
    const row = referenceRow<AirLeakageRow>(ref, 'air-leakage', classId);
    if (!row) throw new EngineInputError(`${field}.airLeakageClassId`, `unknown air-leakage class '${classId}'`);
    targetAch = row.airChangesPerHour;
    description = `air leakage brought to '${row.label ?? classId}' (${targetAch} air changes per hour)`;
    changed = { airLeakageClassId: classId, airChangesPerHourOverride: null };
  }
  if (!(targetAch < presentAch)) {
    return notApplicable(
      base,
      description,
      `The house already leaks no more than that: ${presentAch} air changes per hour now${typeof house.airChangesPerHourOverride === 'number' ? ' (measured)' : ''}, ${targetAch} after sealing.`,
    );
  }
  return {
    variant: withHouse(changed),
    options: {},
    description,
    lightChange: null,
    notes: [],
    notApplicableReason: null,
  };
}

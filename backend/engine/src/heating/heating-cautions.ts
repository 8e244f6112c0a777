import { SURFACE_GROUPS, quantityToken } from '../vocabulary';
import type { HouseGeometry } from '../geometry/house-geometry';
import type { HouseSpec } from '../house.types';
import type { ReferenceData } from '../reference-data.types';
import type { CondensationDetails } from './condensation';
import { designHeatLoss, heatLossCoefficients, type HeatLossBreakdown, type HeatLossCoefficients } from './heat-loss';
import type { HeaterSizingDetails } from './heater-sizing';
import type { HeatingConditions } from './heating-conditions';

// Quantities in cautions are tokens (see prose.ts): the reader's unit system shows them.
const kW = (watts: number) => quantityToken('power', watts);
const degC = (celsius: number) => quantityToken('temperature', celsius);

export interface HeatingCautionSources {
  house: HouseSpec;
  conditions: HeatingConditions;
  insideC: number;
  geometry: HouseGeometry;
  coefficients: HeatLossCoefficients;
  /** density of the inside air, kg/m³ (to price a drawn curtain at the same conditions) */
  airDensityKgPerM3: number;
  heatLoss: HeatLossBreakdown;
  sizing: HeaterSizingDetails;
  condensation: CondensationDetails;
  /** the combustion-safety cautions of fuel-fired heaters (empty without them) */
  combustionCautions: string[];
}

/**
 * The cautions that go with a design-night estimate: no heat needed, heaters short, a single
 * unit, an uncredited curtain, condensation, unchecked handbook values, combustion safety and the
 * closing word on licensed installers.
 */
export function heatingCautions(
  {
    house,
    conditions,
    insideC,
    geometry,
    coefficients,
    airDensityKgPerM3,
    heatLoss,
    sizing,
    condensation,
    combustionCautions,
  }: HeatingCautionSources,
  ref: ReferenceData,
): string[] {
  const outsideC = conditions.designOutdoorC;
  const curtainRow = coefficients.rows.curtain;
  const cautions: string[] = [];
  if (heatLoss.deltaTK <= 0) {
    cautions.push(
      `The design outdoor temperature (${degC(outsideC)}) is not below the inside temperature (${degC(insideC)}): no heating is needed at these conditions.`,
    );
  }
  if (sizing.result.verdict === 'short') {
    cautions.push(
      `Installed output ${kW(sizing.result.installedOutputW)} is ${kW(sizing.result.shortfallW)} short of the ${kW(sizing.result.requiredOutputW)} required; ` +
        `it holds ${degC(insideC)} inside only down to ${degC(sizing.result.lowestHeldOutdoorC as number)} outside.`,
    );
  }
  if (sizing.result.unitCount === 1) {
    cautions.push('Only one heating unit: if it fails the crop has no heat. Split the output over at least two units.');
  }
  if (curtainRow && !coefficients.curtainApplied) {
    const closed = heatLossCoefficients(house, geometry, ref, {
      curtainClosed: true,
      airDensityKgPerM3,
      windSpeedMPerS: conditions.designWindSpeedMPerS ?? undefined,
    });
    const closedLossW = designHeatLoss(closed, geometry, insideC, outsideC).totalW;
    cautions.push(
      `The curtain is not credited: heaters are sized for a night with it open (it is opened to shed snow and can fail to close). Drawn, the loss would be about ${kW(closedLossW)}.`,
    );
  }
  const condensing = condensation.result.surfaces.filter((surface) => surface.condenses);
  if (condensing.length > 0) {
    cautions.push(
      `Water condenses on the inside of the ${condensing.map((surface) => surface.group).join(', ')} at these conditions ` +
        `(dew point ${degC(condensation.result.dewPointC)}). Drip wets foliage and spreads disease: consider a second layer or anti-condensate film, air movement, or venting and heating to lower humidity.`,
    );
  }
  if (
    coefficients.overridesUsed.coveringU.length < SURFACE_GROUPS.length &&
    SURFACE_GROUPS.some((group) => coefficients.rows.coverings[group].confidence === 'memory')
  ) {
    cautions.push(
      "Covering U-values and air-change rates are handbook values not yet checked against the primary tables; treat the heat loss as a planning range and enter a maker's tested U-value where you have one.",
    );
  }
  cautions.push(...combustionCautions);
  cautions.push(
    'Estimates are for planning. Heater selection and installation rest with licensed installers and local codes.',
  );
  return cautions;
}

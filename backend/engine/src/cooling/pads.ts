import type { PadTypeRow } from './cooling-reference';

export interface PadSizing {
  padTypeId: string;
  faceVelocityMPerS: number;
  saturationEfficiency: number;
  areaNeededM2: number;
  areaM2: number;
  verdict: 'adequate' | 'short';
  leavingAirAtPeakC: number;
}

/** Pad area for a flow at the pad type's design face velocity, against the area installed. */
export function padSizing(
  padType: PadTypeRow,
  areaM2: number,
  designFlowM3PerS: number,
  leavingAirAtPeakC: number,
): PadSizing {
  const areaNeededM2 = designFlowM3PerS / padType.faceVelocityMPerS;
  return {
    padTypeId: padType.id,
    faceVelocityMPerS: padType.faceVelocityMPerS,
    saturationEfficiency: padType.saturationEfficiency,
    areaNeededM2,
    areaM2,
    verdict: areaM2 >= areaNeededM2 * (1 - 1e-9) ? 'adequate' : 'short',
    leavingAirAtPeakC,
  };
}

import type { SurfaceGroup } from '../vocabulary';
import { dewPointC } from '../psychrometrics/psychrometrics';
import type { ReferenceData } from '../reference-data.types';
import { insideSurfaceCoefficientRow, type SurfaceCoefficientRow } from './heating-reference';

/**
 * Condensation on the inside of the covering. In steady state the heat crossing the inside air
 * film equals the heat crossing the whole covering, so
 *   h_i (T_i − T_si) = U (T_i − T_o)   ⇒   T_si = T_i − (U / h_i)(T_i − T_o).
 * Water condenses where T_si is at or below the dew point of the inside air. Solving T_si = T_dew
 * for T_o gives the outdoor temperature below which it starts:
 *   T_o = T_i − (T_i − T_dew) · h_i / U.
 * The covering's own U is used (no curtain credit): a drawn curtain leaves the covering colder,
 * not warmer. Under a clear sky the covering sees the sky instead of the air and behaves as if the
 * air were `skyCoolingK` colder (heating/sky-radiation.ts). U can never exceed h_i physically (U includes the inside film); a user override
 * above h_i is capped there so the surface is never colder than outside.
 */
export interface CondensationSurfaceInput {
  group: SurfaceGroup;
  coveringId: string;
  uWPerM2K: number;
  /** on a clear night: how much colder the air seems to this covering, K (heating/sky-radiation.ts); default 0 */
  skyCoolingK?: number;
}

export interface CondensationSurface {
  group: SurfaceGroup;
  coveringId: string;
  uWPerM2K: number;
  insideSurfaceC: number;
  condenses: boolean;
  condensationBelowOutdoorC: number;
}

export interface CondensationResult {
  insideC: number;
  insideRelativeHumidityPct: number;
  dewPointC: number;
  anyCondenses: boolean;
  surfaces: CondensationSurface[];
}

export interface CondensationDetails {
  result: CondensationResult;
  /** the inside film coefficients used, per group */
  insideFilmRows: Record<SurfaceGroup, SurfaceCoefficientRow>;
}

export function insideSurfaceTemperatureC(
  insideC: number,
  outsideC: number,
  uWPerM2K: number,
  insideFilmWPerM2K: number,
): number {
  const filmRatio = Math.min(uWPerM2K / insideFilmWPerM2K, 1);
  return insideC - filmRatio * (insideC - outsideC);
}

export function condensationRisk(
  conditions: { insideC: number; outsideC: number; insideRelativeHumidityPct: number },
  surfaces: CondensationSurfaceInput[],
  ref: ReferenceData,
): CondensationDetails {
  const { insideC, outsideC, insideRelativeHumidityPct } = conditions;
  const dewC = dewPointC(insideC, insideRelativeHumidityPct);
  const insideFilmRows = {
    roof: insideSurfaceCoefficientRow(ref, 'roof'),
    sidewalls: insideSurfaceCoefficientRow(ref, 'sidewalls'),
    endwalls: insideSurfaceCoefficientRow(ref, 'endwalls'),
  };
  const results = surfaces.map((surface): CondensationSurface => {
    const insideFilmWPerM2K = insideFilmRows[surface.group].hWPerM2K;
    const skyCoolingK = surface.skyCoolingK ?? 0;
    const insideSurfaceC = insideSurfaceTemperatureC(
      insideC,
      outsideC - skyCoolingK,
      surface.uWPerM2K,
      insideFilmWPerM2K,
    );
    const filmRatio = Math.min(surface.uWPerM2K / insideFilmWPerM2K, 1);
    return {
      group: surface.group,
      coveringId: surface.coveringId,
      uWPerM2K: surface.uWPerM2K,
      insideSurfaceC,
      condenses: insideSurfaceC <= dewC,
      // the outdoor air temperature at which it starts: the covering then sees air `skyCoolingK` colder
      condensationBelowOutdoorC: insideC - (insideC - dewC) / filmRatio + skyCoolingK,
    };
  });
  return {
    result: {
      insideC,
      insideRelativeHumidityPct,
      dewPointC: dewC,
      anyCondenses: results.some((surface) => surface.condenses),
      surfaces: results,
    },
    insideFilmRows,
  };
}

import { ApiProperty } from '@nestjs/swagger';
import { ASSUMPTION_CONFIDENCES } from '@thermbay/engine/vocabulary';
import { SURFACE_GROUPS, type SurfaceGroup } from '@thermbay/engine/vocabulary';
import type { HeatLossComponentKey } from '@thermbay/engine/heating/heat-loss';
import type { HeaterVerdict } from '@thermbay/engine/heating/heater-sizing';
import { PROSE_TOKENS_NOTE } from '@thermbay/engine/vocabulary';

/*
 * The engine's HeatingEstimate, described class by class for the OpenAPI document so the
 * frontend's generated types match what the engine returns. Property names are the engine's.
 */

export const HEAT_LOSS_COMPONENT_KEYS: readonly HeatLossComponentKey[] = [
  'roof',
  'sidewalls',
  'endwalls',
  'kneewall',
  'perimeter',
  'infiltration',
  'sky',
];
export const HEATER_VERDICTS: readonly HeaterVerdict[] = ['adequate', 'short', 'none-installed'];
/** reference-data confidence marks, plus the values a user typed for this house */
export const HEATING_ASSUMPTION_CONFIDENCES = ASSUMPTION_CONFIDENCES;

export class HouseGeometrySummaryDto {
  @ApiProperty({ description: 'm²' }) floorAreaM2: number;
  @ApiProperty({ description: 'm²' }) roofAreaM2: number;
  @ApiProperty({ description: 'm²' }) sidewallAreaM2: number;
  @ApiProperty({ description: 'glazed endwall area, m²' }) endwallAreaM2: number;
  @ApiProperty({ description: 'opaque kneewall on the sidewalls and endwalls, m² (0 without one)' })
  kneewallAreaM2: number;
  @ApiProperty({ description: 'roof + sidewalls + endwalls + kneewall, m²' }) coverAreaM2: number;
  @ApiProperty({ description: 'outside perimeter of the house at the ground, m' }) perimeterM: number;
  @ApiProperty({ description: 'm³' }) volumeM3: number;
}

export class HeatLossComponentDto {
  @ApiProperty({ enum: HEAT_LOSS_COMPONENT_KEYS }) key: HeatLossComponentKey;
  @ApiProperty() label: string;
  @ApiProperty({ description: 'area (m²), perimeter (m) or volume (m³), see quantityUnit' }) quantity: number;
  @ApiProperty({ enum: ['m2', 'm', 'm3'] }) quantityUnit: 'm2' | 'm' | 'm3';
  @ApiProperty({
    description: 'U in W/(m²·K) for surfaces, F in W/(m·K) for the perimeter, air changes per hour for infiltration',
  })
  coefficient: number;
  @ApiProperty({ description: 'W/K' }) conductanceWPerK: number;
  @ApiProperty({ description: 'loss at the design ΔT, W' }) watts: number;
  @ApiProperty({ minimum: 0, maximum: 1, description: 'share of the total, 0–1' }) share: number;
}

export class WindFactorsDto {
  @ApiProperty() roof: number;
  @ApiProperty() sidewalls: number;
  @ApiProperty() endwalls: number;
}

export class WindSummaryDto {
  @ApiProperty({ description: 'design wind speed, m/s' }) windSpeedMPerS: number;
  @ApiProperty({ description: 'the wind the U tables assume, m/s' }) tableWindSpeedMPerS: number;
  @ApiProperty({ type: WindFactorsDto, description: 'U at the design wind ÷ tabulated U, per covering group' })
  uFactor: WindFactorsDto;
  @ApiProperty({ description: 'air changes at the design wind ÷ tabulated air changes' }) infiltrationFactor: number;
}

export class HeatLossBreakdownDto {
  @ApiProperty({ description: '°C' }) insideC: number;
  @ApiProperty({ description: '°C' }) outsideC: number;
  @ApiProperty({ description: 'inside − outside, K (may be ≤ 0: then no heat is needed)' }) deltaTK: number;
  @ApiProperty({ description: 'W' }) totalW: number;
  @ApiProperty({ description: 'through the coverings, W' }) coveringW: number;
  @ApiProperty({ description: 'through the opaque kneewall, W (0 without one)' }) kneewallW: number;
  @ApiProperty({ description: 'through the perimeter, W' }) perimeterW: number;
  @ApiProperty({ description: 'air leakage, W' }) infiltrationW: number;
  @ApiProperty({ description: 'long-wave loss to a clear night sky, W (0 unless a clear night was asked for)' })
  skyW: number;
  @ApiProperty() curtainApplied: boolean;
  @ApiProperty({ type: WindSummaryDto }) wind: WindSummaryDto;
  @ApiProperty({ type: HeatLossComponentDto, isArray: true }) components: HeatLossComponentDto[];
}

export class HeaterSizingDto {
  @ApiProperty({ description: 'fraction added to the design loss' }) safetyMargin: number;
  @ApiProperty({ description: 'W' }) requiredOutputW: number;
  @ApiProperty({ description: 'W' }) requiredInputW: number;
  @ApiProperty({ description: 'W' }) installedInputW: number;
  @ApiProperty({ description: 'W' }) installedOutputW: number;
  @ApiProperty({ enum: HEATER_VERDICTS }) verdict: HeaterVerdict;
  @ApiProperty({ description: 'W (0 when adequate)' }) shortfallW: number;
  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'outdoor temperature at which the installed output just holds the inside temperature, °C',
  })
  lowestHeldOutdoorC: number | null;
  @ApiProperty() unitCount: number;
  @ApiProperty({ description: 'W' }) largestUnitOutputW: number;
  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'same with the largest unit out of service, °C; null without a second unit',
  })
  holdsWithLargestUnitOutC: number | null;
  @ApiProperty({ description: `how the output is split over units; ${PROSE_TOKENS_NOTE}` }) splitAdvice: string;
  @ApiProperty() fuelFired: boolean;
}

export class CondensationSurfaceDto {
  @ApiProperty({ enum: SURFACE_GROUPS }) group: SurfaceGroup;
  @ApiProperty() coveringId: string;
  @ApiProperty({ description: 'W/(m²·K)' }) uWPerM2K: number;
  @ApiProperty({ description: '°C' }) insideSurfaceC: number;
  @ApiProperty() condenses: boolean;
  @ApiProperty({ description: 'outdoor temperature below which water condenses on this surface, °C' })
  condensationBelowOutdoorC: number;
}

export class CondensationDto {
  @ApiProperty({ description: '°C' }) insideC: number;
  @ApiProperty({ description: '%' }) insideRelativeHumidityPct: number;
  @ApiProperty({ description: '°C' }) dewPointC: number;
  @ApiProperty() anyCondenses: boolean;
  @ApiProperty({ type: CondensationSurfaceDto, isArray: true }) surfaces: CondensationSurfaceDto[];
}

export class HeatingLampsDto {
  @ApiProperty({ description: 'electrical input of all the lamps while they run, W' }) electricW: number;
  @ApiProperty({ description: 'heat they give the house while they run, W' }) heatW: number;
  @ApiProperty({
    enum: [0],
    description: 'heat credited against the design heat loss and heater sizing: always 0 (lamps may be off that night)',
  })
  creditedW: 0;
  @ApiProperty({ minimum: 0, description: 'lamp heat ÷ design heat loss, for the reader' }) shareOfDesignLoss: number;
}

export class HeatingAssumptionDto {
  @ApiProperty() key: string;
  @ApiProperty({ description: PROSE_TOKENS_NOTE }) label: string;
  @ApiProperty({ oneOf: [{ type: 'number' }, { type: 'string' }] }) value: number | string;
  @ApiProperty() unit: string;
  @ApiProperty() source: string;
  @ApiProperty({ enum: HEATING_ASSUMPTION_CONFIDENCES }) confidence: string;
  @ApiProperty({ description: 'true when a value entered for the house replaced the reference value' })
  overridden: boolean;
}

export class HeatingEstimateDto {
  @ApiProperty({ type: HouseGeometrySummaryDto }) geometry: HouseGeometrySummaryDto;
  @ApiProperty({ type: HeatLossBreakdownDto }) heatLoss: HeatLossBreakdownDto;
  @ApiProperty({ type: HeaterSizingDto }) heater: HeaterSizingDto;
  @ApiProperty({ type: CondensationDto }) condensation: CondensationDto;
  @ApiProperty({
    type: HeatingLampsDto,
    nullable: true,
    description: 'the supplemental lamps, shown but never credited on the design night; null without lamps',
  })
  lamps: HeatingLampsDto | null;
  @ApiProperty({ type: HeatingAssumptionDto, isArray: true }) assumptions: HeatingAssumptionDto[];
  @ApiProperty({
    type: String,
    isArray: true,
    description: `safety and planning cautions, to show with the result; ${PROSE_TOKENS_NOTE}`,
  })
  cautions: string[];
}

/** Conditions the per-house estimate ran with, every default filled in. */
export class HeatingConditionsUsedDto {
  @ApiProperty({ description: '°C' }) designOutdoorC: number;
  @ApiProperty({ description: 'm' }) elevationM: number;
  @ApiProperty({ description: '%' }) insideRelativeHumidityPct: number;
  @ApiProperty({ description: '°C' }) insideC: number;
  @ApiProperty() curtainClosed: boolean;
  @ApiProperty({ description: 'm/s' }) designWindSpeedMPerS: number;
  @ApiProperty() clearSky: boolean;
}

/** Where each condition came from: the request, or the default named. */
export class HeatingConditionsSourceDto {
  @ApiProperty({ enum: ['farm climate', 'request'] }) designOutdoorC: 'farm climate' | 'request';
  @ApiProperty({ enum: ['farm', 'request'] }) elevationM: 'farm' | 'request';
  @ApiProperty({ enum: ['reference data', 'request'] }) insideRelativeHumidityPct: 'reference data' | 'request';
  @ApiProperty({ enum: ['house night setpoint', 'request'] }) insideC: 'house night setpoint' | 'request';
  @ApiProperty({ enum: ['default', 'request'] }) curtainClosed: 'default' | 'request';
  @ApiProperty({ enum: ['farm climate', 'reference data', 'request'] })
  designWindSpeedMPerS: 'farm climate' | 'reference data' | 'request';
  @ApiProperty({ enum: ['default', 'request'] }) clearSky: 'default' | 'request';
}

export class HouseHeatingEstimateDto extends HeatingEstimateDto {
  @ApiProperty() houseId: number;
  @ApiProperty({ type: HeatingConditionsUsedDto }) conditionsUsed: HeatingConditionsUsedDto;
  @ApiProperty({ type: HeatingConditionsSourceDto }) conditionsSource: HeatingConditionsSourceDto;
}

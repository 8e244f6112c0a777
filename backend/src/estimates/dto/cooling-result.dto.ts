import { ApiProperty } from '@nestjs/swagger';
import type { AssumptionConfidence } from '@thermbay/engine/vocabulary';
import { ASSUMPTION_CONFIDENCES } from '@thermbay/engine/vocabulary';
import { CoolingConditionsDto, CoolingSiteDto } from './cooling-request.dto';
import { PROSE_TOKENS_NOTE } from '@thermbay/engine/vocabulary';

/*
 * The engine's CoolingEstimate, described class by class for the OpenAPI document so the
 * frontend's generated types match what the engine returns. Property names are the engine's.
 */

export class AirExchangeDto {
  @ApiProperty({ description: 'all installed fans together, m³/s' }) installedFlowM3PerS: number;
  @ApiProperty({ description: '1/h' }) airChangesPerHour: number;
  @ApiProperty({ description: '1/min' }) airChangesPerMinute: number;
  @ApiProperty({ description: 'm³/s per m² of floor' }) flowPerFloorAreaM3PerSM2: number;
}

export class CapacityFactorsDto {
  @ApiProperty() elevation: number;
  @ApiProperty() light: number;
  @ApiProperty() temperatureRise: number;
  @ApiProperty() velocity: number;
  @ApiProperty({ description: 'elevation × light × temperatureRise' }) house: number;
  @ApiProperty({ description: 'the larger of house and velocity' }) applied: number;
}

export class CoolingCapacityDto {
  @ApiProperty({ description: 'm³/s per m² of floor' }) baseRateM3PerSM2: number;
  @ApiProperty({ type: CapacityFactorsDto }) factors: CapacityFactorsDto;
  @ApiProperty({ description: 'base rate × applied factor × floor area: the floor-area method alone, m³/s' })
  floorAreaMethodFlowM3PerS: number;
  @ApiProperty({ minimum: 0, description: 'flow the lamps’ heat adds over the floor-area method, m³/s' })
  lampFlowM3PerS: number;
  @ApiProperty({
    type: Number,
    nullable: true,
    description:
      'the design-day solar hour that sets the requirement with the lamps; null when the floor-area method does',
  })
  lampGoverningHour: number | null;
  @ApiProperty({ description: 'the larger of the floor-area method and the lit hours’ need, m³/s' })
  requiredFlowM3PerS: number;
  @ApiProperty({ description: 'm³/s' }) installedFlowM3PerS: number;
  @ApiProperty({ enum: ['adequate', 'short', 'no-fans'] }) verdict: 'adequate' | 'short' | 'no-fans';
  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'fans of the installed size needed in all; null without fans',
  })
  fansNeeded: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'fans to add; null without fans' }) additionalFansNeeded:
    number | null;
  @ApiProperty({ description: 'm²' }) inletAreaNeededM2: number;
  @ApiProperty({ description: 'm²' }) inletAreaM2: number;
  @ApiProperty({ enum: ['adequate', 'short'] }) inletVerdict: 'adequate' | 'short';
}

export class InteriorLightDto {
  @ApiProperty({
    enum: ['design day', 'entered'],
    description:
      "'design day': the design day's own clear-sky sun through the roof (the same sun as the hour-by-hour balance); 'entered': the request's peakInteriorLightLux",
  })
  from: 'design day' | 'entered';
  @ApiProperty({ description: 'peak light at plant height under the roof before any shade cloth, lx' })
  unshadedLux: number;
  @ApiProperty({
    minimum: 0,
    maximum: 1,
    description: 'share a shade cloth in place on the design date passes; 1 without',
  })
  shadeTransmittance: number;
  @ApiProperty({ description: 'unshadedLux × shadeTransmittance: the light the light factor reads, lx' })
  lux: number;
}

export class CoolingShadeClothDto {
  @ApiProperty({ minimum: 0, maximum: 1 }) solarTransmittance: number;
  @ApiProperty({ type: Number, isArray: true, description: 'months the cloth is in place, 1–12, in calendar order' })
  months: number[];
  @ApiProperty({ description: 'the design date falls in one of its months: only then does it shade the design day' })
  inPlaceOnDesignDate: boolean;
}

export class DesignDayHourDto {
  @ApiProperty({ minimum: 0, maximum: 23, description: 'local apparent solar hour' }) hour: number;
  @ApiProperty({ description: '°C' }) outdoorC: number;
  @ApiProperty({ description: 'degrees above the horizon (negative at night)' }) sunAltitudeDeg: number;
  @ApiProperty({ description: 'W/m²' }) globalHorizontalWPerM2: number;
  @ApiProperty({ description: 'W' }) solarGainW: number;
  @ApiProperty({ description: 'heat of supplemental lamps running this hour, W (0 when off)' }) lampHeatW: number;
  @ApiProperty({ description: '°C' }) indoorWithFansC: number;
  @ApiProperty({ minimum: 0, maximum: 1 }) fanFraction: number;
  @ApiProperty({ type: Number, nullable: true, description: '°C; null without pads' }) indoorWithPadsC: number | null;
  @ApiProperty() setpointHeld: boolean;
}

export class DesignDayDto {
  @ApiProperty({ description: 'YYYY-MM-DD' }) date: string;
  @ApiProperty({ type: DesignDayHourDto, isArray: true }) hours: DesignDayHourDto[];
  @ApiProperty({ description: '°C' }) peakIndoorWithFansC: number;
  @ApiProperty({ type: Number, nullable: true, description: '°C; null without pads' }) peakIndoorWithPadsC:
    number | null;
  @ApiProperty({ type: Number, isArray: true, description: 'solar hours at which the cooling setpoint is not held' })
  hoursNotHeld: number[];
}

export class PadSizingDto {
  @ApiProperty() padTypeId: string;
  @ApiProperty({ description: 'm/s' }) faceVelocityMPerS: number;
  @ApiProperty({ minimum: 0, maximum: 1 }) saturationEfficiency: number;
  @ApiProperty({ description: 'm²' }) areaNeededM2: number;
  @ApiProperty({ description: 'm²' }) areaM2: number;
  @ApiProperty({ enum: ['adequate', 'short'] }) verdict: 'adequate' | 'short';
  @ApiProperty({ description: '°C' }) leavingAirAtPeakC: number;
}

export class FanStageDto {
  @ApiProperty() stage: number;
  @ApiProperty({ description: 'indoor temperature at which this stage switches on, °C' }) onAtC: number;
  @ApiProperty({ description: 'fans switched on at this stage (not cumulative)' }) fans: number;
}

export class StagingDto {
  @ApiProperty({ description: 'K' }) deadbandK: number;
  @ApiProperty({ description: 'K' }) requiredDeadbandK: number;
  @ApiProperty() ok: boolean;
  @ApiProperty({ type: String, isArray: true, description: PROSE_TOKENS_NOTE }) warnings: string[];
  @ApiProperty({ type: FanStageDto, isArray: true }) stages: FanStageDto[];
}

export class WinterVentilationDto {
  @ApiProperty() fractionOfSummerRate: number;
  @ApiProperty({
    description: 'm³/s: the summer rate the fraction is taken of (base rate × floor area × elevation factor only)',
  })
  summerBaseFlowM3PerS: number;
  @ApiProperty({ description: 'm³/s' }) flowM3PerS: number;
  @ApiProperty({ description: '1/h' }) airChangesPerHour: number;
  @ApiProperty({ description: 'W to warm the ventilation air to the night setpoint' }) heatCostW: number;
  @ApiProperty({ description: '°C' }) atOutdoorC: number;
  @ApiProperty({
    description: 'W lost by the house itself (cover, perimeter, leaks) at the same temperatures, for comparison',
  })
  houseHeatLossW: number;
}

export class CoolingLampsDto {
  @ApiProperty({ description: 'electrical input of all the lamps while they run, W' }) electricW: number;
  @ApiProperty({ description: 'heat they give the house while they run, W' }) heatW: number;
  @ApiProperty({ description: "hours they run on the design day (the design month's value)" }) hoursOn: number;
  @ApiProperty({ description: 'sunrise in solar hours, where the block of lamp hours ends' }) sunriseSolarHour: number;
  @ApiProperty({ minimum: 0, description: 'fan flow the lamps add to the requirement, m³/s' }) addedFlowM3PerS: number;
  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'the solar hour that sets the requirement with the lamps; null when the floor-area method does',
  })
  governingHour: number | null;
}

export class CoolingAssumptionDto {
  @ApiProperty() key: string;
  @ApiProperty({ description: PROSE_TOKENS_NOTE }) label: string;
  @ApiProperty({ oneOf: [{ type: 'number' }, { type: 'string' }] }) value: number | string;
  @ApiProperty() unit: string;
  @ApiProperty() source: string;
  @ApiProperty({ enum: ASSUMPTION_CONFIDENCES, description: "'user-entered' for what the house itself states" })
  confidence: AssumptionConfidence;
  @ApiProperty({ description: 'true when the request replaced the default' }) overridden: boolean;
}

export class CoolingEstimateDto {
  @ApiProperty({ type: AirExchangeDto }) airExchange: AirExchangeDto;
  @ApiProperty({ type: CoolingCapacityDto }) capacity: CoolingCapacityDto;
  @ApiProperty({ type: InteriorLightDto, description: 'the peak interior light the light factor read' })
  interiorLight: InteriorLightDto;
  @ApiProperty({ type: CoolingShadeClothDto, nullable: true, description: "the house's shade cloth; null without one" })
  shadeCloth: CoolingShadeClothDto | null;
  @ApiProperty({ type: DesignDayDto }) designDay: DesignDayDto;
  @ApiProperty({ type: PadSizingDto, nullable: true, description: 'null without evaporative pads' })
  pads: PadSizingDto | null;
  @ApiProperty({ type: StagingDto }) staging: StagingDto;
  @ApiProperty({ type: WinterVentilationDto }) winterVentilation: WinterVentilationDto;
  @ApiProperty({
    type: CoolingLampsDto,
    nullable: true,
    description: 'the supplemental lamps on the design day; null without lamps or when they do not run that month',
  })
  lamps: CoolingLampsDto | null;
  @ApiProperty({ type: CoolingAssumptionDto, isArray: true }) assumptions: CoolingAssumptionDto[];
  @ApiProperty({
    type: String,
    isArray: true,
    description: `safety and planning cautions, to show with the result; ${PROSE_TOKENS_NOTE}`,
  })
  cautions: string[];
}

/** Where each condition came from: the request, or the default named. */
export class CoolingConditionsSourceDto {
  @ApiProperty({ enum: ['calendar default', 'request'] }) designDate: 'calendar default' | 'request';
  @ApiProperty({ enum: ['farm climate', 'request'] }) summerDesignC: 'farm climate' | 'request';
  @ApiProperty({ enum: ['farm climate', 'request'] }) dailyRangeK: 'farm climate' | 'request';
  @ApiProperty({ enum: ['farm climate', 'request'] }) summerDesignWetBulbC: 'farm climate' | 'request';
  @ApiProperty({ enum: ['reference data', 'request'] }) allowedTemperatureRiseK: 'reference data' | 'request';
  @ApiProperty({
    enum: ['design day', 'request'],
    description: "'design day': the design day's own clear-sky light through the roof",
  })
  peakInteriorLightLux: 'design day' | 'request';
  @ApiProperty({ enum: ['house length', 'request'] }) padToFanDistanceM: 'house length' | 'request';
  @ApiProperty({ enum: ['reference data', 'request'] }) transpirationFraction: 'reference data' | 'request';
  @ApiProperty({ enum: ['none', 'request'] }) evaporativePad: 'none' | 'request';
  @ApiProperty({ enum: ['farm climate', 'reference data', 'request'] }) winterDesignC:
    'farm climate' | 'reference data' | 'request';
}

export class HouseCoolingEstimateDto extends CoolingEstimateDto {
  @ApiProperty() houseId: number;
  @ApiProperty({ type: CoolingSiteDto, description: 'the farm’s position and elevation' }) siteUsed: CoolingSiteDto;
  @ApiProperty({
    type: CoolingConditionsDto,
    description: 'what the engine ran with; optional values left out took the defaults listed in assumptions',
  })
  conditionsUsed: CoolingConditionsDto;
  @ApiProperty({ type: CoolingConditionsSourceDto }) conditionsSource: CoolingConditionsSourceDto;
}

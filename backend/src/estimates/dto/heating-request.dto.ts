import { Omittable } from '../../common/validation';
import { ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsBoolean, IsNumber, IsObject, Max, Min, ValidateNested } from 'class-validator';
import { BOUNDS, OUTDOOR_TEMPERATURE_LIMITS_C } from '@thermbay/engine/vocabulary';
import { HouseSpecDto } from '../../houses/dto/house.dto';

/** Conditions of the heating design night, as the engine takes them. */
export class HeatingConditionsDto {
  @ApiProperty({
    minimum: BOUNDS.designOutdoorC.min,
    maximum: BOUNDS.designOutdoorC.max,
    description: 'winter design dry bulb (99 % or 99.6 %), °C',
  })
  @IsNumber()
  @Min(BOUNDS.designOutdoorC.min)
  @Max(BOUNDS.designOutdoorC.max)
  designOutdoorC: number;

  @ApiProperty({
    minimum: BOUNDS.elevationM.min,
    maximum: BOUNDS.elevationM.max,
    description: 'site elevation, m (sets air density)',
  })
  @IsNumber()
  @Min(BOUNDS.elevationM.min)
  @Max(BOUNDS.elevationM.max)
  elevationM: number;

  @ApiProperty({
    minimum: BOUNDS.relativeHumidityPct.min,
    maximum: BOUNDS.relativeHumidityPct.max,
    description: 'inside relative humidity on the design night, %',
  })
  @IsNumber()
  @Min(BOUNDS.relativeHumidityPct.min)
  @Max(BOUNDS.relativeHumidityPct.max)
  insideRelativeHumidityPct: number;

  @ApiPropertyOptional({
    minimum: BOUNDS.setpointC.min,
    maximum: BOUNDS.setpointC.max,
    description: 'inside temperature to hold, °C; default the house night heating setpoint',
  })
  @Omittable()
  @IsNumber()
  @Min(BOUNDS.setpointC.min)
  @Max(BOUNDS.setpointC.max)
  insideC?: number;

  @ApiPropertyOptional({
    description: 'credit a drawn curtain in the design loss; default false (heaters sized with the curtain open)',
  })
  @Omittable()
  @IsBoolean()
  curtainClosed?: boolean;

  @ApiPropertyOptional({
    minimum: BOUNDS.designWindSpeedMPerS.min,
    maximum: BOUNDS.designWindSpeedMPerS.max,
    description: "design wind speed, m/s; default the farm climate's, else the 6.7 m/s (15 mph) the U tables assume",
  })
  @Omittable()
  @IsNumber()
  @Min(BOUNDS.designWindSpeedMPerS.min)
  @Max(BOUNDS.designWindSpeedMPerS.max)
  designWindSpeedMPerS?: number;

  @ApiPropertyOptional({
    description:
      'size for a clear night: add the long-wave loss to a sky colder than the air through a covering that passes ' +
      'thermal infrared; default false (the tabulated U-values, surroundings at the outdoor air temperature)',
  })
  @Omittable()
  @IsBoolean()
  clearSky?: boolean;

  @ApiPropertyOptional({
    minimum: OUTDOOR_TEMPERATURE_LIMITS_C.min,
    maximum: OUTDOOR_TEMPERATURE_LIMITS_C.max,
    description: 'outdoor dew point on a clear design night, °C (at most the design temperature); default 3 K below it',
  })
  @Omittable()
  @IsNumber()
  @Min(OUTDOOR_TEMPERATURE_LIMITS_C.min)
  @Max(OUTDOOR_TEMPERATURE_LIMITS_C.max)
  outdoorDewPointC?: number;
}

export class PartialHeatingConditionsDto extends PartialType(HeatingConditionsDto, { skipNullProperties: false }) {}

/** POST /api/estimates: a house described in the request, nothing stored. */
export class HeatingEstimateRequestDto {
  @ApiProperty({ type: HouseSpecDto }) @IsObject() @ValidateNested() @Type(() => HouseSpecDto) house: HouseSpecDto;
  @ApiProperty({ type: HeatingConditionsDto })
  @IsObject()
  @ValidateNested()
  @Type(() => HeatingConditionsDto)
  conditions: HeatingConditionsDto;
}

/** POST /api/houses/:houseId/estimate: anything left out comes from the farm, its climate, the house or reference data. */
export class HouseHeatingEstimateRequestDto {
  @ApiPropertyOptional({ type: PartialHeatingConditionsDto })
  @Omittable()
  @IsObject()
  @ValidateNested()
  @Type(() => PartialHeatingConditionsDto)
  conditions?: PartialHeatingConditionsDto;
}

import { IsCalendarDate, Omittable } from '../../common/validation';
import { ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsNumber, IsObject, IsOptional, IsString, Length, Max, Min, ValidateNested } from 'class-validator';
import { BOUNDS } from '@thermbay/engine/vocabulary';
import { COOLING_BOUNDS } from '@thermbay/engine/vocabulary';
import { HouseSpecDto } from '../../houses/dto/house.dto';

type Range = { readonly min: number; readonly max: number };
const range = (bounds: Range) => ({ minimum: bounds.min, maximum: bounds.max });

export class CoolingSiteDto {
  @ApiProperty({ ...range(BOUNDS.latitudeDeg), description: 'degrees, north positive' })
  @IsNumber()
  @Min(BOUNDS.latitudeDeg.min)
  @Max(BOUNDS.latitudeDeg.max)
  latitudeDeg: number;

  @ApiProperty({ ...range(BOUNDS.longitudeDeg), description: 'degrees, east positive' })
  @IsNumber()
  @Min(BOUNDS.longitudeDeg.min)
  @Max(BOUNDS.longitudeDeg.max)
  longitudeDeg: number;

  @ApiProperty({ ...range(BOUNDS.elevationM), description: 'm' })
  @IsNumber()
  @Min(BOUNDS.elevationM.min)
  @Max(BOUNDS.elevationM.max)
  elevationM: number;
}

export class EvaporativePadDto {
  @ApiProperty({ description: 'reference-data evaporative-pads id', example: 'cellulose-150mm' })
  @IsString()
  @Length(1, 80)
  padTypeId: string;

  @ApiProperty({ ...range(COOLING_BOUNDS.padAreaM2), description: 'face area of the pads, m²' })
  @IsNumber()
  @Min(COOLING_BOUNDS.padAreaM2.min)
  @Max(COOLING_BOUNDS.padAreaM2.max)
  areaM2: number;
}

/** Conditions of the summer design day, as the engine takes them. */
export class CoolingConditionsDto {
  @ApiProperty({ description: 'YYYY-MM-DD; hours of the result are local apparent solar time', example: '2026-07-21' })
  @IsString()
  @IsCalendarDate()
  designDate: string;

  @ApiProperty({ ...range(BOUNDS.summerDesignC), description: 'summer design dry bulb (the day’s maximum), °C' })
  @IsNumber()
  @Min(BOUNDS.summerDesignC.min)
  @Max(BOUNDS.summerDesignC.max)
  summerDesignC: number;

  @ApiProperty({ ...range(COOLING_BOUNDS.dailyRangeK), description: 'day’s maximum − minimum, K' })
  @IsNumber()
  @Min(COOLING_BOUNDS.dailyRangeK.min)
  @Max(COOLING_BOUNDS.dailyRangeK.max)
  dailyRangeK: number;

  @ApiProperty({
    ...range(COOLING_BOUNDS.summerDesignWetBulbC),
    description: 'wet bulb coincident with the design dry bulb (not above it), °C',
  })
  @IsNumber()
  @Min(COOLING_BOUNDS.summerDesignWetBulbC.min)
  @Max(COOLING_BOUNDS.summerDesignWetBulbC.max)
  summerDesignWetBulbC: number;

  @ApiPropertyOptional({
    ...range(COOLING_BOUNDS.allowedTemperatureRiseK),
    description: 'allowed inlet-to-fan rise, K; default from reference data',
  })
  @Omittable()
  @IsNumber()
  @Min(COOLING_BOUNDS.allowedTemperatureRiseK.min)
  @Max(COOLING_BOUNDS.allowedTemperatureRiseK.max)
  allowedTemperatureRiseK?: number;

  @ApiPropertyOptional({
    ...range(COOLING_BOUNDS.peakInteriorLightLux),
    description:
      "peak light at plant height under the roof before any shade cloth, lux (a cloth in place multiplies it); when left out, the design day's own clear-sky light through the roof, the same sun the hour-by-hour balance uses",
  })
  @Omittable()
  @IsNumber()
  @Min(COOLING_BOUNDS.peakInteriorLightLux.min)
  @Max(COOLING_BOUNDS.peakInteriorLightLux.max)
  peakInteriorLightLux?: number;

  @ApiPropertyOptional({
    ...range(COOLING_BOUNDS.padToFanDistanceM),
    description: 'inlet (pad) wall to fans, m; default the house length',
  })
  @Omittable()
  @IsNumber()
  @Min(COOLING_BOUNDS.padToFanDistanceM.min)
  @Max(COOLING_BOUNDS.padToFanDistanceM.max)
  padToFanDistanceM?: number;

  @ApiPropertyOptional({
    ...range(COOLING_BOUNDS.transpirationFraction),
    description: 'share of transmitted solar heat taken up by transpiration; default from reference data',
  })
  @Omittable()
  @IsNumber()
  @Min(COOLING_BOUNDS.transpirationFraction.min)
  @Max(COOLING_BOUNDS.transpirationFraction.max)
  transpirationFraction?: number;

  @ApiPropertyOptional({
    type: EvaporativePadDto,
    nullable: true,
    description: 'evaporative pads on the inlet wall, or null for none',
  })
  @IsOptional()
  @IsObject()
  @ValidateNested()
  @Type(() => EvaporativePadDto)
  evaporativePad?: EvaporativePadDto | null;

  @ApiPropertyOptional({
    ...range(BOUNDS.designOutdoorC),
    description: 'winter design temperature for the humidity-ventilation heat cost, °C',
  })
  @Omittable()
  @IsNumber()
  @Min(BOUNDS.designOutdoorC.min)
  @Max(BOUNDS.designOutdoorC.max)
  winterDesignC?: number;
}

export class PartialCoolingConditionsDto extends PartialType(CoolingConditionsDto, { skipNullProperties: false }) {}

/** POST /api/estimates/cooling: house and site described in the request, nothing stored. */
export class CoolingEstimateRequestDto {
  @ApiProperty({ type: HouseSpecDto }) @IsObject() @ValidateNested() @Type(() => HouseSpecDto) house: HouseSpecDto;
  @ApiProperty({ type: CoolingSiteDto }) @IsObject() @ValidateNested() @Type(() => CoolingSiteDto) site: CoolingSiteDto;
  @ApiProperty({ type: CoolingConditionsDto })
  @IsObject()
  @ValidateNested()
  @Type(() => CoolingConditionsDto)
  conditions: CoolingConditionsDto;
}

/** POST /api/houses/:houseId/cooling: anything left out comes from the farm, its climate or reference data. */
export class HouseCoolingEstimateRequestDto {
  @ApiPropertyOptional({ type: PartialCoolingConditionsDto })
  @Omittable()
  @IsObject()
  @ValidateNested()
  @Type(() => PartialCoolingConditionsDto)
  conditions?: PartialCoolingConditionsDto;
}

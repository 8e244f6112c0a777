import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsInt,
  IsNumber,
  IsOptional,
  IsString,
  Max,
  MaxLength,
  Min,
  ValidateNested,
  IsObject,
} from 'class-validator';
import { BOUNDS, CLIMATE_BOUNDS } from '@thermbay/engine/vocabulary';

export class MonthlyClimateDto {
  @ApiProperty({ minimum: 1, maximum: 12 }) @IsInt() @Min(1) @Max(12) month: number;
  @ApiProperty({
    minimum: CLIMATE_BOUNDS.monthlyMeanC.min,
    maximum: CLIMATE_BOUNDS.monthlyMeanC.max,
    description: 'mean of the daily minimum temperatures, °C',
  })
  @IsNumber()
  @Min(CLIMATE_BOUNDS.monthlyMeanC.min)
  @Max(CLIMATE_BOUNDS.monthlyMeanC.max)
  meanDailyMinC: number;
  @ApiProperty({
    minimum: CLIMATE_BOUNDS.monthlyMeanC.min,
    maximum: CLIMATE_BOUNDS.monthlyMeanC.max,
    description: 'mean of the daily maximum temperatures, °C',
  })
  @IsNumber()
  @Min(CLIMATE_BOUNDS.monthlyMeanC.min)
  @Max(CLIMATE_BOUNDS.monthlyMeanC.max)
  meanDailyMaxC: number;
  @ApiPropertyOptional({
    minimum: CLIMATE_BOUNDS.clearnessFraction.min,
    maximum: CLIMATE_BOUNDS.clearnessFraction.max,
    nullable: true,
    type: Number,
    description: 'actual ÷ clear-sky solar over the month; default from reference data',
  })
  @IsOptional()
  @IsNumber()
  @Min(CLIMATE_BOUNDS.clearnessFraction.min)
  @Max(CLIMATE_BOUNDS.clearnessFraction.max)
  clearness?: number | null;
}

export class SiteClimateDto {
  @ApiProperty({
    minimum: BOUNDS.designOutdoorC.min,
    maximum: BOUNDS.designOutdoorC.max,
    description: 'heating design dry bulb (99 % or 99.6 %), °C',
  })
  @IsNumber()
  @Min(BOUNDS.designOutdoorC.min)
  @Max(BOUNDS.designOutdoorC.max)
  winterDesignC: number;

  @ApiProperty({
    minimum: BOUNDS.summerDesignC.min,
    maximum: BOUNDS.summerDesignC.max,
    description: 'cooling design dry bulb (1 %), °C',
  })
  @IsNumber()
  @Min(BOUNDS.summerDesignC.min)
  @Max(BOUNDS.summerDesignC.max)
  summerDesignC: number;

  @ApiProperty({
    minimum: CLIMATE_BOUNDS.summerDesignWetBulbC.min,
    maximum: CLIMATE_BOUNDS.summerDesignWetBulbC.max,
    description: 'wet bulb coincident with the summer design dry bulb, °C',
  })
  @IsNumber()
  @Min(CLIMATE_BOUNDS.summerDesignWetBulbC.min)
  @Max(CLIMATE_BOUNDS.summerDesignWetBulbC.max)
  summerDesignWetBulbC: number;

  @ApiProperty({
    minimum: CLIMATE_BOUNDS.summerDailyRangeK.min,
    maximum: CLIMATE_BOUNDS.summerDailyRangeK.max,
    description: 'mean daily range on the summer design day, K',
  })
  @IsNumber()
  @Min(CLIMATE_BOUNDS.summerDailyRangeK.min)
  @Max(CLIMATE_BOUNDS.summerDailyRangeK.max)
  summerDailyRangeK: number;

  @ApiProperty({ type: MonthlyClimateDto, isArray: true, description: 'exactly 12 rows, one per month' })
  @IsArray()
  @ArrayMinSize(12)
  @ArrayMaxSize(12)
  @IsObject({ each: true })
  @ValidateNested({ each: true })
  @Type(() => MonthlyClimateDto)
  monthly: MonthlyClimateDto[];

  @ApiPropertyOptional({
    nullable: true,
    type: String,
    description: 'where the numbers came from (e.g. national climate normals, station name)',
  })
  @IsOptional()
  @IsString()
  @MaxLength(CLIMATE_BOUNDS.sourceNoteLength.max)
  sourceNote?: string | null;

  @ApiPropertyOptional({
    nullable: true,
    type: Number,
    minimum: BOUNDS.designWindSpeedMPerS.min,
    maximum: BOUNDS.designWindSpeedMPerS.max,
    description:
      'winter design wind speed, m/s; null: the 6.7 m/s (15 mph) the U tables assume (reference-data/wind.json)',
  })
  @IsOptional()
  @IsNumber()
  @Min(BOUNDS.designWindSpeedMPerS.min)
  @Max(BOUNDS.designWindSpeedMPerS.max)
  designWindSpeedMPerS?: number | null;
}

export class FarmClimateDto {
  @ApiProperty() farmId: number;
  @ApiProperty({ type: SiteClimateDto, nullable: true, description: 'null until someone enters the climate' })
  climate: SiteClimateDto | null;
  @ApiProperty({ description: '0 until the first save, then raised by one on every save; send it in If-Match' })
  version: number;
}

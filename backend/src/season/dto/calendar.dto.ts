import { Omittable } from '../../common/validation';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsIn,
  IsNumber,
  IsString,
  Matches,
  Max,
  MaxLength,
  Min,
  ValidateNested,
  IsObject,
} from 'class-validator';
import { BOUNDS } from '@thermbay/engine/vocabulary';

const MONTH_DAY = /^\d{2}-\d{2}$/;

export class ProductionPeriodDto {
  @ApiProperty({ example: '11-15', description: "first day, 'MM-DD'" })
  @Matches(MONTH_DAY, { message: 'startMonthDay must be written MM-DD' })
  startMonthDay: string;

  @ApiProperty({ example: '03-31', description: "last day (inclusive), 'MM-DD'; may wrap the year end" })
  @Matches(MONTH_DAY, { message: 'endMonthDay must be written MM-DD' })
  endMonthDay: string;

  @ApiProperty({ enum: ['heated', 'empty'] }) @IsIn(['heated', 'empty']) mode: 'heated' | 'empty';

  @ApiPropertyOptional({
    minimum: BOUNDS.setpointC.min,
    maximum: BOUNDS.setpointC.max,
    description: "replaces the house's day heating setpoint in this period, °C",
  })
  @Omittable()
  @IsNumber()
  @Min(BOUNDS.setpointC.min)
  @Max(BOUNDS.setpointC.max)
  dayHeatingC?: number;

  @ApiPropertyOptional({
    minimum: BOUNDS.setpointC.min,
    maximum: BOUNDS.setpointC.max,
    description: "replaces the house's night heating setpoint in this period, °C",
  })
  @Omittable()
  @IsNumber()
  @Min(BOUNDS.setpointC.min)
  @Max(BOUNDS.setpointC.max)
  nightHeatingC?: number;

  @ApiPropertyOptional({ maxLength: 100, example: 'Spring bedding crop' })
  @Omittable()
  @IsString()
  @MaxLength(100)
  label?: string;
}

export class PutProductionCalendarDto {
  @ApiProperty({
    type: ProductionPeriodDto,
    isArray: true,
    maxItems: 24,
    description:
      'empty list = heated all season at the house setpoints; otherwise days no period covers are unheated, and where periods overlap the later one wins',
  })
  @IsArray()
  @ArrayMaxSize(24)
  @IsObject({ each: true })
  @ValidateNested({ each: true })
  @Type(() => ProductionPeriodDto)
  periods: ProductionPeriodDto[];
}

export class ProductionCalendarDto extends PutProductionCalendarDto {
  @ApiProperty() houseId: number;
  @ApiProperty({ description: '0 until the first save, then raised by one on every save; send it in If-Match' })
  version: number;
}

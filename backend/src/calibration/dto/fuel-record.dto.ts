import { ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsInt,
  IsNumber,
  IsOptional,
  IsPositive,
  IsString,
  Max,
  MaxLength,
  Min,
} from 'class-validator';
import { IsCalendarDate, Omittable } from '../../common/validation';

const QUANTITY_MAX = 1e9;

/** A fuel bill or tank delivery as the user enters it. */
export class CreateFuelRecordDto {
  @ApiProperty({ example: 'propane', description: 'reference-data fuels id' })
  @IsString()
  @MaxLength(100)
  fuelId: string;

  @ApiProperty({ example: 1200, exclusiveMinimum: true, minimum: 0, maximum: QUANTITY_MAX })
  @IsNumber({}, { message: 'enter the quantity as a number' })
  @IsPositive({ message: 'the quantity must be more than zero' })
  @Max(QUANTITY_MAX, { message: 'the quantity is too large' })
  quantity: number;

  @ApiProperty({
    example: 'US gal',
    description:
      "one of the fuel's purchase units: its unitSi or unitUs in reference-data/fuels.json (therm, m³, US gal, L, kWh, short ton, kg)",
  })
  @IsString()
  @MaxLength(20)
  quantityUnit: string;

  @ApiPropertyOptional({
    type: Number,
    nullable: true,
    minimum: 0,
    description: "money, the farm's currency; null = not entered",
  })
  @IsOptional()
  @IsNumber({}, { message: 'enter the cost as a number' })
  @Min(0, { message: 'the cost cannot be negative' })
  @Max(1e10)
  cost?: number | null;

  @ApiProperty({
    example: '2025-11-01',
    description: 'first day the bill covers (for a tank delivery: the day after the previous fill), YYYY-MM-DD',
  })
  @IsCalendarDate({ message: 'write the start date as YYYY-MM-DD' })
  startDate: string;

  @ApiProperty({
    example: '2025-11-30',
    description: 'last day the bill covers (inclusive), YYYY-MM-DD; at most 366 days after the start',
  })
  @IsCalendarDate({ message: 'write the end date as YYYY-MM-DD' })
  endDate: string;

  @ApiProperty({ type: [Number], description: 'houses the meter or tank serves (houses of this farm)' })
  @IsArray()
  @ArrayMinSize(1, { message: 'choose at least one house the fuel went to' })
  @ArrayMaxSize(200)
  @IsInt({ each: true })
  @Min(1, { each: true })
  houseIds: number[];

  @ApiPropertyOptional({
    type: Number,
    nullable: true,
    minimum: 0,
    description:
      'fuel used for other things than heating the houses (a dryer, washing water), in quantityUnit per day; null = none',
  })
  @IsOptional()
  @IsNumber({}, { message: 'enter the non-heating use per day as a number' })
  @Min(0, { message: 'the non-heating use per day cannot be negative' })
  @Max(QUANTITY_MAX)
  nonHeatingPerDay?: number | null;

  @ApiPropertyOptional({ type: String, nullable: true, maxLength: 500 })
  @IsOptional()
  @IsString()
  @MaxLength(500)
  note?: string | null;
}

export class UpdateFuelRecordDto extends PartialType(CreateFuelRecordDto) {}

export class FuelRecordDto {
  @ApiProperty() id: number;
  @ApiProperty() farmId: number;
  @ApiProperty() fuelId: string;
  @ApiProperty() fuelLabel: string;
  @ApiProperty() quantity: number;
  @ApiProperty() quantityUnit: string;
  @ApiProperty({ description: 'the energy the quantity holds (higher heat content), kWh' }) fuelEnergyKWh: number;
  @ApiProperty({ type: Number, nullable: true }) cost: number | null;
  @ApiProperty() startDate: string;
  @ApiProperty() endDate: string;
  @ApiProperty() days: number;
  @ApiProperty({ type: [Number] }) houseIds: number[];
  @ApiProperty({ type: Number, nullable: true }) nonHeatingPerDay: number | null;
  @ApiProperty({ type: String, nullable: true }) note: string | null;
  @ApiProperty() version: number;
}

/** The columns of a fuel-record CSV file the user confirmed, or one value for every row. */
export class FuelRecordColumnMappingDto {
  @ApiPropertyOptional({ description: 'column holding the fuel (id or name); or give fuelId for every row' })
  @Omittable()
  @IsString()
  @MaxLength(200)
  fuelColumn?: string;

  @ApiPropertyOptional({ description: 'the fuel of every row, when the file has no fuel column' })
  @Omittable()
  @IsString()
  @MaxLength(100)
  fuelId?: string;

  @ApiProperty() @IsString() @MaxLength(200) quantityColumn: string;

  @ApiPropertyOptional({ description: 'column holding the unit; or give unit for every row' })
  @Omittable()
  @IsString()
  @MaxLength(200)
  unitColumn?: string;

  @ApiPropertyOptional({ description: 'the unit of every row, when the file has no unit column' })
  @Omittable()
  @IsString()
  @MaxLength(20)
  unit?: string;

  @ApiPropertyOptional() @Omittable() @IsString() @MaxLength(200) costColumn?: string;
  @ApiProperty() @IsString() @MaxLength(200) startColumn: string;
  @ApiProperty() @IsString() @MaxLength(200) endColumn: string;

  @ApiPropertyOptional({
    description: 'column holding house names separated by ; or |; or give houseIds for every row',
  })
  @Omittable()
  @IsString()
  @MaxLength(200)
  housesColumn?: string;

  @ApiPropertyOptional({ type: [Number], description: 'the houses of every row, when the file has no house column' })
  @Omittable()
  @IsArray()
  @ArrayMaxSize(200)
  @IsInt({ each: true })
  houseIds?: number[];

  @ApiPropertyOptional() @Omittable() @IsString() @MaxLength(200) nonHeatingColumn?: string;
}

export class FuelRecordCsvInspectionDto {
  @ApiProperty({ type: [String] }) columns: string[];
  @ApiProperty({
    description: 'the first rows as read, at most 5',
    type: 'array',
    items: { type: 'array', items: { type: 'string' } },
  })
  preview: string[][];
  @ApiProperty({ description: 'data rows in the file' }) rowCount: number;
  @ApiProperty({
    type: FuelRecordColumnMappingDto,
    description: 'columns guessed from the header; the user confirms or changes them',
  })
  proposed: Partial<FuelRecordColumnMappingDto>;
}

export class UploadFuelRecordsDto {
  @ApiProperty({ description: 'FuelRecordColumnMappingDto as JSON' })
  @IsString()
  @MaxLength(5000)
  mapping: string;
}

export class FuelRecordsUploadResultDto {
  @ApiProperty() created: number;
  @ApiProperty({ type: [FuelRecordDto] }) records: FuelRecordDto[];
}

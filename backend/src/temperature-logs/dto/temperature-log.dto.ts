import { Omittable } from '../../common/validation';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsIn, IsOptional, IsString, MaxLength, MinLength } from 'class-validator';
import type { DateOrder, Delimiter, LogResolution, TemperatureUnit } from '../csv/temperature-log-csv';

export const DELIMITERS: readonly Delimiter[] = [',', ';', '\t'];
export const TEMPERATURE_UNITS: readonly TemperatureUnit[] = ['C', 'F'];
export const LOG_RESOLUTIONS: readonly LogResolution[] = ['hourly', 'daily'];
export const DATE_ORDERS: readonly DateOrder[] = ['YMD', 'MDY', 'DMY'];

// ---------------------------------------------------------------------------------------------
// Inspection (nothing stored)

export class ColumnProposalDto {
  @ApiProperty({
    type: String,
    nullable: true,
    description: 'one column holding date and time (or the date alone in a daily file)',
  })
  timestampColumn: string | null;
  @ApiProperty({
    type: String,
    nullable: true,
    description: 'separate date column, when the file splits date and time',
  })
  dateColumn: string | null;
  @ApiProperty({ type: String, nullable: true, description: 'separate time-of-day column' })
  timeColumn: string | null;
  @ApiProperty({
    type: String,
    nullable: true,
    description: 'the (mean) temperature; null when a daily file has only minimum and maximum',
  })
  temperatureColumn: string | null;
  @ApiProperty({ type: String, nullable: true }) minColumn: string | null;
  @ApiProperty({ type: String, nullable: true }) maxColumn: string | null;
  @ApiProperty({ enum: TEMPERATURE_UNITS }) unit: TemperatureUnit;
  @ApiProperty({ description: 'why the unit was guessed, in words' }) unitReason: string;
  @ApiProperty({ enum: LOG_RESOLUTIONS }) resolution: LogResolution;
  @ApiProperty({ enum: DATE_ORDERS, description: 'order of day, month and year in dates with the year last' })
  dateOrder: DateOrder;
  @ApiProperty({ description: 'true when day-first and month-first both fit the dates seen; the user should confirm' })
  dateOrderAmbiguous: boolean;
  @ApiProperty({ description: 'numbers are written with a decimal comma' }) decimalComma: boolean;
}

export class TemperatureCsvInspectionDto {
  @ApiProperty({ enum: DELIMITERS, description: "',' ';' or a tab" }) delimiter: Delimiter;
  @ApiProperty() hasHeader: boolean;
  @ApiProperty({
    type: String,
    isArray: true,
    description: "column names (from the header, or 'Column 1', 'Column 2' … without one)",
  })
  headers: string[];
  @ApiProperty({
    type: 'array',
    items: { type: 'array', items: { type: 'string' } },
    description: 'the first data rows as they appear',
  })
  sampleRows: string[][];
  @ApiProperty({ description: 'data rows in the file' }) dataRowCount: number;
  @ApiProperty({ type: ColumnProposalDto }) proposal: ColumnProposalDto;
  @ApiProperty({ type: String, isArray: true }) notes: string[];
}

// ---------------------------------------------------------------------------------------------
// Upload

/** The columns the user confirmed; names are entries of the inspection's `headers`. */
export class TemperatureColumnMappingDto {
  @ApiPropertyOptional({ type: String, nullable: true }) @IsOptional() @IsString() @MaxLength(200) timestampColumn?:
    string | null;
  @ApiPropertyOptional({ type: String, nullable: true }) @IsOptional() @IsString() @MaxLength(200) dateColumn?:
    string | null;
  @ApiPropertyOptional({ type: String, nullable: true }) @IsOptional() @IsString() @MaxLength(200) timeColumn?:
    string | null;
  @ApiPropertyOptional({ type: String, nullable: true }) @IsOptional() @IsString() @MaxLength(200) temperatureColumn?:
    string | null;
  @ApiPropertyOptional({ type: String, nullable: true }) @IsOptional() @IsString() @MaxLength(200) minColumn?:
    string | null;
  @ApiPropertyOptional({ type: String, nullable: true }) @IsOptional() @IsString() @MaxLength(200) maxColumn?:
    string | null;
  @ApiProperty({ enum: TEMPERATURE_UNITS }) @IsIn(TEMPERATURE_UNITS) unit: TemperatureUnit;
  @ApiPropertyOptional({ enum: LOG_RESOLUTIONS, description: 'inferred from the times when absent' })
  @Omittable()
  @IsIn(LOG_RESOLUTIONS)
  resolution?: LogResolution;
  @ApiPropertyOptional({ enum: DATE_ORDERS }) @Omittable() @IsIn(DATE_ORDERS) dateOrder?: DateOrder;
  @ApiPropertyOptional() @Omittable() @IsBoolean() decimalComma?: boolean;
  @ApiPropertyOptional({ enum: DELIMITERS, description: 'detected when absent' })
  @Omittable()
  @IsIn(DELIMITERS)
  delimiter?: Delimiter;
  @ApiPropertyOptional({ description: 'detected when absent' }) @Omittable() @IsBoolean() hasHeader?: boolean;
}

/** The text fields of the multipart upload (the file itself is the `file` part). */
export class UploadTemperatureLogDto {
  @ApiProperty({ minLength: 1, maxLength: 200, description: "the log's name, e.g. 'Station north, winter 2025–26'" })
  @IsString()
  @MinLength(1)
  @MaxLength(200)
  name: string;

  @ApiProperty({
    description:
      'TemperatureColumnMappingDto as a JSON string: the columns the user confirmed after inspecting the file',
  })
  @IsString()
  @MaxLength(10_000)
  mapping: string;
}

// ---------------------------------------------------------------------------------------------
// Stored logs

export class TemperatureLogDto {
  @ApiProperty() id: number;
  @ApiProperty() farmId: number;
  @ApiProperty() name: string;
  @ApiProperty({ enum: LOG_RESOLUTIONS }) resolution: LogResolution;
  @ApiProperty({ description: "first reading's date, YYYY-MM-DD" }) startDate: string;
  @ApiProperty({ description: "last reading's date, YYYY-MM-DD" }) endDate: string;
  @ApiProperty({ description: 'data rows in the file' }) rowCount: number;
  @ApiProperty({ description: 'readings kept (rows without any temperature are skipped)' }) readingCount: number;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
}

export class TemperatureLogDayDto {
  @ApiProperty({ description: 'YYYY-MM-DD (as logged)' }) date: string;
  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'lowest reading (hourly) or the logged minimum (daily), °C; null for a daily log with means only',
  })
  minC: number | null;
  @ApiProperty({ description: 'mean of the readings (hourly) or the logged temperature (daily), °C' }) meanC: number;
  @ApiProperty({ type: Number, nullable: true, description: '°C' }) maxC: number | null;
  @ApiProperty({ description: 'readings that day' }) readingCount: number;
}

/** A stored log with its readings reduced to one row per day for a chart. */
export class TemperatureLogDetailDto extends TemperatureLogDto {
  @ApiProperty({ type: TemperatureColumnMappingDto, description: 'how the file was read' })
  mapping: TemperatureColumnMappingDto;
  @ApiProperty({ type: TemperatureLogDayDto, isArray: true }) days: TemperatureLogDayDto[];
}

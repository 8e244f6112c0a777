import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsIn,
  IsNumber,
  IsOptional,
  IsString,
  Max,
  MaxLength,
  Min,
  ValidateNested,
  IsObject,
} from 'class-validator';
import type { PriceUnit } from '@thermbay/engine/season/fuel';
import { PRICE_UNITS } from './season-request.dto';

export class FuelPriceInputDto {
  @ApiProperty({ description: 'reference-data fuels id (one price per fuel)' })
  @IsString()
  @MaxLength(100)
  fuelId: string;
  @ApiProperty({ minimum: 0, maximum: 1e6, description: 'money per purchase unit' })
  @IsNumber()
  @Min(0)
  @Max(1e6)
  pricePerUnit: number;
  @ApiProperty({
    enum: PRICE_UNITS,
    description: "'si': per the fuel's unitSi (m³, L, kg, kWh); 'us': per its unitUs (therm, US gal, short ton, kWh)",
  })
  @IsIn(PRICE_UNITS)
  priceUnit: PriceUnit;
  @ApiPropertyOptional({
    type: String,
    nullable: true,
    maxLength: 300,
    description: 'where the price came from (supplier, contract, date)',
  })
  @IsOptional()
  @IsString()
  @MaxLength(300)
  note?: string | null;
}

export class PutFuelPricesDto {
  @ApiProperty({ type: FuelPriceInputDto, isArray: true, description: 'replaces every price of the farm' })
  @IsArray()
  @ArrayMaxSize(50)
  @IsObject({ each: true })
  @ValidateNested({ each: true })
  @Type(() => FuelPriceInputDto)
  prices: FuelPriceInputDto[];
}

export class FuelPriceDto extends FuelPriceInputDto {
  @ApiProperty({ example: 'Propane' }) fuelLabel: string;
  @ApiProperty({ example: 'US gal', description: 'the unit the price is per' }) priceUnitLabel: string;
}

export class FarmFuelPricesDto {
  @ApiProperty() farmId: number;
  @ApiProperty({ type: FuelPriceDto, isArray: true }) prices: FuelPriceDto[];
  @ApiProperty({ description: 'version of the set, raised by one on every save; send it in If-Match' })
  version: number;
}

import { Omittable } from '../../common/validation';
import { ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayUnique,
  ArrayMinSize,
  IsArray,
  IsBoolean,
  IsIn,
  IsInt,
  IsNumber,
  IsObject,
  IsOptional,
  IsString,
  Length,
  Max,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import { BOUNDS, LAMP_MONTHS } from '@thermbay/engine/vocabulary';
import { HEATER_TYPES, HOUSE_SHAPES, type HeaterType, type HouseShape } from '@thermbay/engine/vocabulary';

const range = (name: keyof typeof BOUNDS) => ({ minimum: BOUNDS[name].min, maximum: BOUNDS[name].max });

export class CoveringsDto {
  @ApiProperty({ description: 'reference-data coverings id', example: 'poly-double-inflated' })
  @IsString()
  @Length(1, 80)
  roof: string;
  @ApiProperty({ description: 'reference-data coverings id' }) @IsString() @Length(1, 80) sidewalls: string;
  @ApiProperty({ description: 'reference-data coverings id' }) @IsString() @Length(1, 80) endwalls: string;
}

export class CoveringOverridesDto {
  @ApiPropertyOptional({ ...range('uValueWPerM2K'), description: 'W/(m²·K)' })
  @Omittable()
  @IsNumber()
  @Min(BOUNDS.uValueWPerM2K.min)
  @Max(BOUNDS.uValueWPerM2K.max)
  roof?: number;

  @ApiPropertyOptional({ ...range('uValueWPerM2K'), description: 'W/(m²·K)' })
  @Omittable()
  @IsNumber()
  @Min(BOUNDS.uValueWPerM2K.min)
  @Max(BOUNDS.uValueWPerM2K.max)
  sidewalls?: number;

  @ApiPropertyOptional({ ...range('uValueWPerM2K'), description: 'W/(m²·K)' })
  @Omittable()
  @IsNumber()
  @Min(BOUNDS.uValueWPerM2K.min)
  @Max(BOUNDS.uValueWPerM2K.max)
  endwalls?: number;
}

export class ShadeClothDto {
  @ApiProperty({
    ...range('shadeClothTransmittance'),
    description:
      'share of the sun (heat and light alike) the cloth passes, 0–1: a "50 % shade" cloth passes about 0.5 (typical cloths in reference-data shade-cloths)',
    example: 0.5,
  })
  @IsNumber()
  @Min(BOUNDS.shadeClothTransmittance.min)
  @Max(BOUNDS.shadeClothTransmittance.max)
  solarTransmittance: number;

  @ApiProperty({
    type: Number,
    isArray: true,
    minimum: BOUNDS.shadeClothMonth.min,
    maximum: BOUNDS.shadeClothMonth.max,
    maxItems: 12,
    uniqueItems: true,
    description: 'calendar months the cloth is in place, 1 = January … 12 = December, each once',
    example: [5, 6, 7, 8, 9],
  })
  @IsArray()
  @ArrayMaxSize(12)
  @ArrayUnique()
  @IsInt({ each: true })
  @Min(BOUNDS.shadeClothMonth.min, { each: true })
  @Max(BOUNDS.shadeClothMonth.max, { each: true })
  months: number[];
}

export class HeaterGroupDto {
  @ApiProperty({ minimum: 1, maximum: BOUNDS.heaterCount.max })
  @IsInt()
  @Min(1)
  @Max(BOUNDS.heaterCount.max)
  count: number;

  @ApiProperty({ ...range('heaterInputW'), description: 'rated input of one unit, W' })
  @IsNumber()
  @Min(BOUNDS.heaterInputW.min)
  @Max(BOUNDS.heaterInputW.max)
  ratedInputW: number;

  @ApiProperty({ ...range('heaterEfficiency'), description: 'output ÷ input, 0–1' })
  @IsNumber()
  @Min(BOUNDS.heaterEfficiency.min)
  @Max(BOUNDS.heaterEfficiency.max)
  efficiency: number;

  @ApiProperty({ description: 'reference-data fuels id', example: 'propane' })
  @IsString()
  @Length(1, 80)
  fuelId: string;

  @ApiPropertyOptional({
    enum: HEATER_TYPES,
    nullable: true,
    description:
      'what kind of heater (reference-data heater-types): its typical efficiency is offered as the default and an unvented fuel-fired type brings the strong cautions; null when not stated',
  })
  @IsOptional()
  @IsIn(HEATER_TYPES)
  heaterType?: HeaterType | null;
}

export class ExhaustFansDto {
  @ApiProperty({ ...range('fanCount') }) @IsInt() @Min(BOUNDS.fanCount.min) @Max(BOUNDS.fanCount.max) count: number;

  @ApiProperty({ ...range('fanCapacityM3PerS'), description: 'm³/s moved by one fan at working static pressure' })
  @IsNumber()
  @Min(BOUNDS.fanCapacityM3PerS.min)
  @Max(BOUNDS.fanCapacityM3PerS.max)
  capacityEachM3PerS: number;
}

export class SetpointsDto {
  @ApiProperty({ ...range('setpointC') })
  @IsNumber()
  @Min(BOUNDS.setpointC.min)
  @Max(BOUNDS.setpointC.max)
  dayHeatingC: number;
  @ApiProperty({ ...range('setpointC') })
  @IsNumber()
  @Min(BOUNDS.setpointC.min)
  @Max(BOUNDS.setpointC.max)
  nightHeatingC: number;
  @ApiProperty({ ...range('setpointC') })
  @IsNumber()
  @Min(BOUNDS.setpointC.min)
  @Max(BOUNDS.setpointC.max)
  coolingC: number;
}

export class LampsDto {
  @ApiPropertyOptional({
    nullable: true,
    type: String,
    description: "reference-data lamps id of a lamp type (kind 'lamp-type'); null when not stated",
    example: 'led-horticultural',
  })
  @IsOptional()
  @IsString()
  @Length(1, 80)
  lampTypeId?: string | null;

  @ApiProperty({ ...range('lampPowerDensityWPerM2'), description: 'electrical input per m² of floor, W/m²' })
  @IsNumber()
  @Min(BOUNDS.lampPowerDensityWPerM2.min)
  @Max(BOUNDS.lampPowerDensityWPerM2.max)
  powerDensityWPerM2: number;

  @ApiProperty({
    type: Number,
    isArray: true,
    minItems: LAMP_MONTHS,
    maxItems: LAMP_MONTHS,
    description: `hours the lamps run per day, January to December (${LAMP_MONTHS} values, ${BOUNDS.lampHoursPerDay.min}–${BOUNDS.lampHoursPerDay.max})`,
  })
  @IsArray()
  @ArrayMinSize(LAMP_MONTHS)
  @ArrayMaxSize(LAMP_MONTHS)
  @IsNumber({}, { each: true })
  @Min(BOUNDS.lampHoursPerDay.min, { each: true })
  @Max(BOUNDS.lampHoursPerDay.max, { each: true })
  hoursPerDayByMonth: number[];

  @ApiProperty({
    ...range('lampHeatToHouseFraction'),
    description: 'share of the electrical input that ends as heat inside the house (reference-data lamps offers 0.95)',
  })
  @IsNumber()
  @Min(BOUNDS.lampHeatToHouseFraction.min)
  @Max(BOUNDS.lampHeatToHouseFraction.max)
  heatToHouseFraction: number;
}

/** The physical description of a house, shared by stored houses and the stateless estimate. */
export class HouseSpecDto {
  @ApiProperty({ enum: HOUSE_SHAPES }) @IsIn(HOUSE_SHAPES) shape: HouseShape;
  @ApiProperty({ ...range('spans') }) @IsInt() @Min(BOUNDS.spans.min) @Max(BOUNDS.spans.max) spans: number;
  @ApiProperty({ ...range('widthM'), description: 'width of one span, m' })
  @IsNumber()
  @Min(BOUNDS.widthM.min)
  @Max(BOUNDS.widthM.max)
  widthM: number;
  @ApiProperty({ ...range('lengthM') }) @IsNumber() @Min(BOUNDS.lengthM.min) @Max(BOUNDS.lengthM.max) lengthM: number;
  @ApiProperty({ ...range('eaveHeightM'), description: 'sidewall or gutter height, m' })
  @IsNumber()
  @Min(BOUNDS.eaveHeightM.min)
  @Max(BOUNDS.eaveHeightM.max)
  eaveHeightM: number;
  @ApiProperty({ ...range('ridgeHeightM') })
  @IsNumber()
  @Min(BOUNDS.ridgeHeightM.min)
  @Max(BOUNDS.ridgeHeightM.max)
  ridgeHeightM: number;

  @ApiProperty({ type: CoveringsDto }) @IsObject() @ValidateNested() @Type(() => CoveringsDto) coverings: CoveringsDto;

  @ApiPropertyOptional({ type: CoveringOverridesDto, description: "a maker's U-value replacing the reference value" })
  @Omittable()
  @IsObject()
  @ValidateNested()
  @Type(() => CoveringOverridesDto)
  coveringUOverridesWPerM2K?: CoveringOverridesDto;

  @ApiProperty({ description: 'reference-data air-leakage id' }) @IsString() @Length(1, 80) airLeakageClassId: string;

  @ApiPropertyOptional({
    ...range('airChangesPerHour'),
    nullable: true,
    type: Number,
    description: 'measured air changes per hour',
  })
  @IsOptional()
  @IsNumber()
  @Min(BOUNDS.airChangesPerHour.min)
  @Max(BOUNDS.airChangesPerHour.max)
  airChangesPerHourOverride?: number | null;

  @ApiProperty() @IsBoolean() perimeterInsulated: boolean;

  @ApiPropertyOptional({
    ...range('kneewallHeightM'),
    nullable: true,
    type: Number,
    description:
      'height of the band at the foot of the sidewalls and endwalls, m (at most the eave height); opaque when kneewallId names a construction, glazing otherwise',
  })
  @IsOptional()
  @IsNumber()
  @Min(BOUNDS.kneewallHeightM.min)
  @Max(BOUNDS.kneewallHeightM.max)
  kneewallHeightM?: number | null;

  @ApiPropertyOptional({
    nullable: true,
    type: String,
    description: 'reference-data kneewalls id of the kneewall construction; null: glazing to the ground',
  })
  @IsOptional()
  @IsString()
  @Length(1, 80)
  kneewallId?: string | null;

  @ApiPropertyOptional({ nullable: true, type: String, description: 'reference-data curtains id, drawn at night' })
  @IsOptional()
  @IsString()
  @Length(1, 80)
  curtainId?: string | null;

  @ApiPropertyOptional({
    type: ShadeClothDto,
    nullable: true,
    description:
      'a shade cloth in place in some months: on the cooling design day it takes its share of the solar heat and of the light the exhaust rate reads, and in the season of the daytime solar gain; null for none',
  })
  @IsOptional()
  @IsObject()
  @ValidateNested()
  @Type(() => ShadeClothDto)
  shadeCloth?: ShadeClothDto | null;

  @ApiProperty({ type: HeaterGroupDto, isArray: true, maxItems: BOUNDS.heaterGroups.max })
  @IsArray()
  @ArrayMaxSize(BOUNDS.heaterGroups.max)
  @IsObject({ each: true })
  @ValidateNested({ each: true })
  @Type(() => HeaterGroupDto)
  heaters: HeaterGroupDto[];

  @ApiProperty({ type: ExhaustFansDto })
  @IsObject()
  @ValidateNested()
  @Type(() => ExhaustFansDto)
  exhaustFans: ExhaustFansDto;

  @ApiProperty({ ...range('inletAreaM2'), description: 'free louvre or inlet area, m²' })
  @IsNumber()
  @Min(BOUNDS.inletAreaM2.min)
  @Max(BOUNDS.inletAreaM2.max)
  inletAreaM2: number;

  @ApiProperty({ type: SetpointsDto }) @IsObject() @ValidateNested() @Type(() => SetpointsDto) setpoints: SetpointsDto;

  @ApiPropertyOptional({
    type: LampsDto,
    nullable: true,
    description:
      'supplemental lamps: their heat lowers the season heating in the hours they run and adds to the summer fan requirement; never credited in heater sizing. null: none',
  })
  @IsOptional()
  @IsObject()
  @ValidateNested()
  @Type(() => LampsDto)
  lamps?: LampsDto | null;
}

export class CreateHouseDto extends HouseSpecDto {
  @ApiProperty({ example: 'House 3', maxLength: BOUNDS.nameLength.max })
  @IsString()
  @Length(BOUNDS.nameLength.min, BOUNDS.nameLength.max)
  name: string;
  @ApiPropertyOptional({ nullable: true, type: String, maxLength: BOUNDS.notesLength.max })
  @IsOptional()
  @IsString()
  @MaxLength(BOUNDS.notesLength.max)
  notes?: string | null;
}

export class UpdateHouseDto extends PartialType(CreateHouseDto, { skipNullProperties: false }) {}

export class HouseDto extends CreateHouseDto {
  @ApiProperty() id: number;
  @ApiProperty() farmId: number;
  @ApiProperty({ nullable: true, type: String }) declare notes: string | null;
  @ApiProperty({ type: CoveringOverridesDto }) declare coveringUOverridesWPerM2K: CoveringOverridesDto;
  @ApiProperty({ nullable: true, type: Number }) declare airChangesPerHourOverride: number | null;
  @ApiProperty({ nullable: true, type: String }) declare curtainId: string | null;
  @ApiProperty({ nullable: true, type: ShadeClothDto, description: 'the shade cloth, or null for none' })
  declare shadeCloth: ShadeClothDto | null;
  @ApiProperty({ description: 'raised by one on every save; send it back in If-Match to update' }) version: number;
  @ApiProperty({ nullable: true, type: Number }) declare kneewallHeightM: number | null;
  @ApiProperty({ nullable: true, type: String }) declare kneewallId: string | null;
  @ApiProperty({ nullable: true, type: LampsDto }) declare lamps: LampsDto | null;
  @ApiProperty() createdAt: string;
  @ApiProperty() updatedAt: string;
}

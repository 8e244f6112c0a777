import { Omittable } from '../../common/validation';
import { ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
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
import { BOUNDS } from '@thermbay/engine/vocabulary';
import { HouseDto } from '../../houses/dto/house.dto';
import { ProductionPeriodDto } from '../../season/dto/calendar.dto';

export const MAX_COST_AMOUNT = 1e8;

const PATCH_DESCRIPTION =
  "the house fields this alternative changes, merged onto the house as it is when read (JSON Merge Patch: objects such as coverings merge key by key, null inside them removes a key; other values replace the house's). Fields not named follow every later edit of the house. Example: { coverings: { roof: 'poly-double-inflated' } }";

export class CreateAlternativeDto {
  @ApiProperty({ example: 'Inflated double poly', maxLength: BOUNDS.nameLength.max })
  @IsString()
  @Length(BOUNDS.nameLength.min, BOUNDS.nameLength.max)
  name: string;

  @ApiPropertyOptional({ nullable: true, type: String, maxLength: BOUNDS.notesLength.max })
  @IsOptional()
  @IsString()
  @MaxLength(BOUNDS.notesLength.max)
  notes?: string | null;

  @ApiPropertyOptional({ type: 'object', additionalProperties: true, description: PATCH_DESCRIPTION })
  @Omittable()
  @IsObject()
  patch?: Record<string, unknown>;

  @ApiPropertyOptional({
    type: 'object',
    additionalProperties: true,
    description:
      'instead of patch: the house as the user edited it (all or some of its fields); the patch is what differs from the stored house',
  })
  @Omittable()
  @IsObject()
  house?: Record<string, unknown>;

  @ApiPropertyOptional({
    type: ProductionPeriodDto,
    isArray: true,
    nullable: true,
    maxItems: 24,
    description: "production periods in place of the house's calendar; null or absent = the house's own calendar",
  })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(24)
  @ValidateNested({ each: true })
  @Type(() => ProductionPeriodDto)
  calendar?: ProductionPeriodDto[] | null;

  @ApiPropertyOptional({
    nullable: true,
    type: Number,
    minimum: 0,
    maximum: MAX_COST_AMOUNT,
    description: 'installed cost, money in the currency of the farm’s fuel prices; null = not entered',
  })
  @IsOptional()
  @IsNumber()
  @Min(0)
  @Max(MAX_COST_AMOUNT)
  costAmount?: number | null;
}

export class UpdateAlternativeDto extends PartialType(CreateAlternativeDto, { skipNullProperties: false }) {}

export class FieldProblemDto {
  @ApiProperty({ example: 'ridgeHeightM', description: 'the house field at fault' }) field: string;
  @ApiProperty() message: string;
}

export class AlternativeDto {
  @ApiProperty() id: number;
  @ApiProperty() houseId: number;
  @ApiProperty() name: string;
  @ApiProperty({ nullable: true, type: String }) notes: string | null;
  @ApiProperty({ type: 'object', additionalProperties: true, description: PATCH_DESCRIPTION })
  patch: Record<string, unknown>;
  @ApiProperty({ type: String, isArray: true, example: ['coverings.roof'], description: 'the fields the patch sets' })
  changedFields: string[];
  @ApiProperty({ type: ProductionPeriodDto, isArray: true, nullable: true }) calendar: ProductionPeriodDto[] | null;
  @ApiProperty({ nullable: true, type: Number }) costAmount: number | null;
  @ApiProperty({ nullable: true, type: Number }) createdById: number | null;
  @ApiProperty({ nullable: true, type: String }) createdByName: string | null;
  @ApiProperty({
    type: FieldProblemDto,
    nullable: true,
    description: 'set when the house as it is now, with this patch, is not a valid house (e.g. ridge under eave)',
  })
  invalid: FieldProblemDto | null;
  @ApiProperty({ type: HouseDto, nullable: true, description: 'the house with the patch applied; null when invalid' })
  house: HouseDto | null;
  @ApiProperty() createdAt: string;
  @ApiProperty() updatedAt: string;
}

export class AdoptAlternativeResultDto {
  @ApiProperty({ type: HouseDto }) house: HouseDto;
  @ApiProperty({ type: AlternativeDto, description: 'the house as it was, kept as an alternative' })
  previous: AlternativeDto;
}

export class DuplicateHouseDto {
  @ApiPropertyOptional({ maxLength: BOUNDS.nameLength.max, description: 'default: the house’s name + " (copy)"' })
  @Omittable()
  @IsString()
  @Length(BOUNDS.nameLength.min, BOUNDS.nameLength.max)
  name?: string;
}

import { ApiProperty, ApiPropertyOptional, OmitType } from '@nestjs/swagger';
import { ArrayMaxSize, ArrayUnique, IsArray, IsInt, IsOptional, Min } from 'class-validator';
import { SURFACE_GROUPS, type SurfaceGroup } from '@thermbay/engine/vocabulary';
import { FieldProblemDto } from '../../alternatives/dto/alternative.dto';
import { CoolingEstimateDto } from '../../estimates/dto/cooling-result.dto';
import { HeatingConditionsUsedDto, HeatingEstimateDto } from '../../estimates/dto/heating-result.dto';
import { SeasonRequestDto } from '../../season/dto/season-request.dto';
import { SeasonEstimateDto, SeasonInputsUsedDto } from '../../season/dto/season-result.dto';

export const MAX_COMPARED_ALTERNATIVES = 4;

export class SideBySideRequestDto extends OmitType(SeasonRequestDto, ['alternativeId'] as const) {
  @ApiPropertyOptional({
    type: Number,
    isArray: true,
    maxItems: MAX_COMPARED_ALTERNATIVES,
    description: "ids of the house's alternatives to set beside it, in column order (at most 4)",
  })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(MAX_COMPARED_ALTERNATIVES)
  @ArrayUnique()
  @IsInt({ each: true })
  @Min(1, { each: true })
  alternativeIds?: number[];
}

export class SurfaceLightDto {
  @ApiProperty({ enum: SURFACE_GROUPS }) group: SurfaceGroup;
  @ApiProperty() coveringId: string;
  @ApiProperty() coveringLabel: string;
  @ApiProperty({ minimum: 0, maximum: 1, description: 'share of daylight the covering lets through (reference value)' })
  lightTransmittance: number;
  @ApiProperty({ description: "transmittance ÷ the house's − 1 for the same surface (negative = light lost)" })
  changeFromHouse: number;
}

export class VersusHouseDto {
  @ApiProperty({
    type: Number,
    nullable: true,
    description: "the house's season cost − this column's, money a year (positive = saves); null without a fuel price",
  })
  yearlySaving: number | null;
  @ApiProperty({ description: 'heat delivered, house − this column, kWh a season' }) heatSavedKWh: number;
  @ApiProperty({ description: 'heat content of the fuel burnt, house − this column, kWh a season' })
  fuelInputSavedKWh: number;
  @ApiProperty({ description: 'design-night heat loss, this column − house, W' }) designHeatLossChangeW: number;
  @ApiProperty({ nullable: true, type: Number, description: 'cost ÷ yearly saving, years' })
  paybackYears: number | null;
  @ApiProperty({
    enum: ['years', 'immediate', 'enter-cost', 'enter-price', 'never'],
    description:
      "'enter-cost' when no cost is entered; 'enter-price' when the farm has no price for the fuel; 'never' when it saves nothing",
  })
  paybackStatus: 'years' | 'immediate' | 'enter-cost' | 'enter-price' | 'never';
}

export class SideBySideColumnDto {
  @ApiProperty({ example: 'alternative-12', description: "'house' or 'alternative-<id>'" }) key: string;
  @ApiProperty({ nullable: true, type: Number }) alternativeId: number | null;
  @ApiProperty() name: string;
  @ApiProperty({
    type: String,
    isArray: true,
    description: 'the house fields the alternative sets (none for the house)',
  })
  changedFields: string[];
  @ApiProperty({ description: 'true when the alternative brings its own production calendar' })
  ownCalendar: boolean;
  @ApiProperty({ nullable: true, type: Number, description: 'installed cost; null = not entered' })
  costAmount: number | null;
  @ApiProperty({
    type: FieldProblemDto,
    nullable: true,
    description: 'set when this alternative cannot be computed now (e.g. ridge under eave after a house edit)',
  })
  invalid: FieldProblemDto | null;
  @ApiProperty({ type: HeatingEstimateDto, nullable: true }) heating: HeatingEstimateDto | null;
  @ApiProperty({ type: CoolingEstimateDto, nullable: true }) cooling: CoolingEstimateDto | null;
  @ApiProperty({ type: SeasonEstimateDto, nullable: true }) season: SeasonEstimateDto | null;
  @ApiProperty({ type: SurfaceLightDto, isArray: true, nullable: true }) light: SurfaceLightDto[] | null;
  @ApiProperty({ type: VersusHouseDto, nullable: true, description: 'null for the house' })
  versusHouse: VersusHouseDto | null;
}

export class SideBySideDto {
  @ApiProperty() houseId: number;
  @ApiProperty() houseName: string;
  @ApiProperty({ type: SideBySideColumnDto, isArray: true, description: 'the house first, then each alternative' })
  columns: SideBySideColumnDto[];
  @ApiProperty({ type: HeatingConditionsUsedDto, description: "the design night of the house's column" })
  heatingConditionsUsed: HeatingConditionsUsedDto;
  @ApiProperty({ type: SeasonInputsUsedDto, description: "the season inputs of the house's column" })
  seasonInputsUsed: SeasonInputsUsedDto;
}

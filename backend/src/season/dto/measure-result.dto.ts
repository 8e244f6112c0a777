import { ApiProperty } from '@nestjs/swagger';
import {
  MEASURE_KINDS,
  PAYBACK_STATUSES,
  type MeasureKind,
  type PaybackStatus,
} from '@thermbay/engine/season/measures';
import { PROSE_TOKENS_NOTE } from '@thermbay/engine/vocabulary';
import { SeasonFuelAmountDto, SeasonInputsUsedDto } from './season-result.dto';

/*
 * The engine's MeasureComparison (a house's season against the same season with each measure)
 * described class by class for the OpenAPI document. Property names are the engine's, except
 * costAmount, the API's name for a measure's cost.
 */

export class MeasureSeasonDto extends SeasonFuelAmountDto {
  @ApiProperty() fuelId: string;
  @ApiProperty() unitSi: string;
  @ApiProperty() unitUs: string;
}

export class MeasureLightChangeDto {
  @ApiProperty({
    enum: ['roof', 'sidewalls', 'kneewall'],
    description: "'kneewall': light through the whole envelope, an opaque kneewall passing none",
  })
  surface: 'roof' | 'sidewalls' | 'kneewall';
  @ApiProperty({ description: 'light transmittance before, 0–1' }) before: number;
  @ApiProperty({ description: 'light transmittance after, 0–1' }) after: number;
  @ApiProperty({ description: 'relative change of light reaching the crop, e.g. −0.11 for 11 % less' })
  relativeChange: number;
  @ApiProperty() source: string;
}

export class MeasureResultDto {
  @ApiProperty({ description: 'position in the request list (or in the default list)' }) index: number;
  @ApiProperty({ enum: MEASURE_KINDS }) kind: MeasureKind;
  @ApiProperty() label: string;
  @ApiProperty({ description: `what changed, in words; ${PROSE_TOKENS_NOTE}` }) description: string;
  @ApiProperty({ type: Number, nullable: true, description: 'null when no cost was entered' }) costAmount:
    number | null;
  @ApiProperty({
    description: 'false when the measure changes nothing for this house (already done, or no better than what it has)',
  })
  applicable: boolean;
  @ApiProperty({
    type: String,
    nullable: true,
    description: `why the measure does not apply, in plain words; null when it applies; ${PROSE_TOKENS_NOTE}`,
  })
  notApplicableReason: string | null;
  @ApiProperty({
    type: MeasureSeasonDto,
    description: 'the season with the measure (the house as it is when the measure does not apply)',
  })
  season: MeasureSeasonDto;
  @ApiProperty({ description: 'heat the house no longer needs, kWh per season (0 for heater or fuel changes)' })
  heatSavedKWh: number;
  @ApiProperty({ description: 'fuel energy no longer bought, kWh per season' }) fuelInputSavedKWh: number;
  @ApiProperty({
    type: Number,
    nullable: true,
    description: "in the baseline fuel's unitSi; null when the measure burns another fuel",
  })
  fuelSavedSi: number | null;
  @ApiProperty({ type: Number, nullable: true, description: "in the baseline fuel's unitUs" }) fuelSavedUs:
    number | null;
  @ApiProperty({
    type: Number,
    nullable: true,
    description:
      'money saved per season (= per year with one season a year); negative when it costs more to run; null without a fuel price',
  })
  yearlyMoneySaved: number | null;
  @ApiProperty({
    enum: PAYBACK_STATUSES,
    description:
      "'years': cost ÷ saving; 'immediate': cost 0 and a saving; 'enter-cost': a saving but no cost entered; 'enter-price': fuel saved but no fuel price known; 'never': no money saved; 'not-applicable': changes nothing for this house",
  })
  paybackStatus: PaybackStatus;
  @ApiProperty({
    type: Number,
    nullable: true,
    description: "cost ÷ yearly money saved, years (0 when 'immediate'); null for the other statuses",
  })
  paybackYears: number | null;
  @ApiProperty({
    example: '2.4 years',
    description: "'2.4 years', 'immediately', 'enter a cost', 'enter the fuel price', 'never' or 'not applicable'",
  })
  paybackText: string;
  @ApiProperty({
    type: MeasureLightChangeDto,
    nullable: true,
    description: 'light change for measures that add a layer or a screen',
  })
  lightChange: MeasureLightChangeDto | null;
  @ApiProperty({ type: String, isArray: true, description: PROSE_TOKENS_NOTE }) notes: string[];
}

export class MeasureComparisonDto {
  @ApiProperty() houseId: number;
  @ApiProperty({ type: MeasureSeasonDto, description: 'the season of the house as it is' }) baseline: MeasureSeasonDto;
  @ApiProperty({
    type: MeasureResultDto,
    isArray: true,
    description:
      'shortest payback first (equal paybacks: larger saving first), then measures without a cost, then those that never pay back, then those that do not apply',
  })
  measures: MeasureResultDto[];
  @ApiProperty({
    description:
      'true when the request listed no measures and the default measures that apply to the house were compared without costs',
  })
  defaultsUsed: boolean;
  @ApiProperty({ type: String, isArray: true, description: PROSE_TOKENS_NOTE }) notes: string[];
  @ApiProperty({ type: SeasonInputsUsedDto }) inputsUsed: SeasonInputsUsedDto;
}

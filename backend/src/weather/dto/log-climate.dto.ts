import { ApiProperty, OmitType } from '@nestjs/swagger';
import { SiteClimateDto } from '../../climate/dto/climate.dto';
import { MonthlyFromWeatherDto } from './weather.dto';

/** The climate a log proposes; a log has no humidity, so the wet bulb is the farm's current one or null. */
export class LogProposedClimateDto extends OmitType(SiteClimateDto, ['summerDesignWetBulbC'] as const) {
  @ApiProperty({
    type: Number,
    nullable: true,
    description: "the farm's current coincident wet bulb (a temperature log has no humidity); null when it has none",
  })
  summerDesignWetBulbC: number | null;
}

export class LogClimateProposalDto {
  @ApiProperty() farmId: number;
  @ApiProperty() temperatureLogId: number;
  @ApiProperty() temperatureLogName: string;
  @ApiProperty({ description: "first hour of the log, local standard time 'YYYY-MM-DDTHH:00'" }) firstHour: string;
  @ApiProperty({ description: 'last hour of the log, local standard time' }) lastHour: string;
  @ApiProperty({ description: 'hours from the first to the last' }) hourCount: number;
  @ApiProperty({ description: 'hours with a reading (the percentiles are over these)' }) hoursUsed: number;
  @ApiProperty({ description: 'dry bulb that 99.6 % of the hours are at or above, °C' }) winterDesign996C: number;
  @ApiProperty({ description: 'dry bulb that 99 % of the hours are at or above, °C' }) winterDesign99C: number;
  @ApiProperty({ description: 'dry bulb that 0.4 % of the hours are at or above, °C' }) summerDesign04C: number;
  @ApiProperty({ description: 'dry bulb that 1 % of the hours are at or above, °C' }) summerDesign1C: number;
  @ApiProperty({ type: Number, nullable: true, description: 'always null: a temperature log has no humidity' })
  summerCoincidentWetBulb04C: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'always null: a temperature log has no humidity' })
  summerCoincidentWetBulb1C: number | null;
  @ApiProperty({ description: 'mean daily range of the warmest month, K' }) summerDailyRangeK: number;
  @ApiProperty({ type: MonthlyFromWeatherDto, isArray: true, description: 'clearness is null (no sunshine logged)' })
  monthly: MonthlyFromWeatherDto[];
  @ApiProperty({ type: LogProposedClimateDto, description: 'what would be saved (99.6 % heating, 1 % cooling)' })
  proposedClimate: LogProposedClimateDto;
  @ApiProperty({ type: SiteClimateDto, nullable: true }) currentClimate: SiteClimateDto | null;
  @ApiProperty({ type: String, isArray: true, description: 'how the values were worked out, in words' })
  notes: string[];
}

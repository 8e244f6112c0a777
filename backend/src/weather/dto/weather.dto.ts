import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, Max, Min } from 'class-validator';
import { SiteClimateDto } from '../../climate/dto/climate.dto';

/** The first year the weather-history service covers. */
export const FIRST_WEATHER_YEAR = 1940;
export const MAX_WEATHER_SPAN_YEARS = 30;

export class WeatherSourceDto {
  @ApiProperty({ description: 'true when the weather is invented by the local stand-in, not measured' })
  standIn: boolean;
  @ApiProperty({ type: String, nullable: true, description: 'the real service in use (WEATHER_API_URL), or null' })
  serviceUrl: string | null;
  @ApiProperty({ description: 'what a reader must know about where the hours come from' }) note: string;
  @ApiProperty() defaultFromYear: number;
  @ApiProperty() defaultToYear: number;
  @ApiProperty({ description: 'the last complete calendar year the service can be asked for' })
  lastCompleteYear: number;
}

export class WeatherYearStatusDto {
  @ApiProperty() year: number;
  @ApiProperty({ description: 'true when the year was already cached and the service was not asked' })
  fromCache: boolean;
  @ApiProperty() hourCount: number;
  @ApiProperty() missingHourCount: number;
}

export class ClimateProposalQueryDto {
  @ApiProperty({ minimum: FIRST_WEATHER_YEAR })
  @Type(() => Number)
  @IsInt()
  @Min(FIRST_WEATHER_YEAR)
  @Max(9999)
  fromYear: number;
  @ApiProperty({ minimum: FIRST_WEATHER_YEAR })
  @Type(() => Number)
  @IsInt()
  @Min(FIRST_WEATHER_YEAR)
  @Max(9999)
  toYear: number;
}

export class WeatherYearUsageDto {
  @ApiProperty() year: number;
  @ApiProperty() hourCount: number;
  @ApiProperty() missingHourCount: number;
  @ApiProperty({ description: 'missing hours ÷ hours, 0–1' }) missingShare: number;
}

export class WeatherYearLeftOutDto extends WeatherYearUsageDto {
  @ApiProperty() reason: string;
}

export class MonthlyFromWeatherDto {
  @ApiProperty() month: number;
  @ApiProperty({ description: '°C' }) meanDailyMinC: number;
  @ApiProperty({ description: '°C' }) meanDailyMaxC: number;
  @ApiProperty({ type: Number, nullable: true, description: 'measured ÷ clear-sky global horizontal, 0–1' })
  clearness: number | null;
  @ApiProperty() dayCount: number;
}

export class ClimateProposalDto {
  @ApiProperty() farmId: number;
  @ApiProperty() fromYear: number;
  @ApiProperty() toYear: number;
  @ApiProperty({ type: WeatherSourceDto }) source: WeatherSourceDto;
  @ApiProperty({ description: 'the grid point the hours belong to (0.1°)' }) gridLatitudeDeg: number;
  @ApiProperty() gridLongitudeDeg: number;
  @ApiProperty({ type: WeatherYearUsageDto, isArray: true }) yearsUsed: WeatherYearUsageDto[];
  @ApiProperty({ type: WeatherYearLeftOutDto, isArray: true }) yearsLeftOut: WeatherYearLeftOutDto[];
  @ApiProperty() hoursUsed: number;
  @ApiProperty({ description: 'dry bulb that 99.6 % of the hours are at or above, °C' }) winterDesign996C: number;
  @ApiProperty({ description: 'dry bulb that 99 % of the hours are at or above, °C' }) winterDesign99C: number;
  @ApiProperty({ description: 'dry bulb that 0.4 % of the hours are at or above, °C' }) summerDesign04C: number;
  @ApiProperty({ description: 'dry bulb that 1 % of the hours are at or above, °C' }) summerDesign1C: number;
  @ApiProperty({ type: Number, nullable: true, description: 'mean coincident wet bulb at the 0.4 % dry bulb, °C' })
  summerCoincidentWetBulb04C: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'mean coincident wet bulb at the 1 % dry bulb, °C' })
  summerCoincidentWetBulb1C: number | null;
  @ApiProperty({ description: 'mean daily range of the warmest month, K' }) summerDailyRangeK: number;
  @ApiProperty({ type: MonthlyFromWeatherDto, isArray: true }) monthly: MonthlyFromWeatherDto[];
  @ApiProperty({
    type: SiteClimateDto,
    description: 'what would be saved: 99.6 % heating and 1 % cooling design values, monthly normals',
  })
  proposedClimate: SiteClimateDto;
  @ApiProperty({ type: SiteClimateDto, nullable: true }) currentClimate: SiteClimateDto | null;
}

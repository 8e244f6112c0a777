import type { SiteClimateDto } from '../climate/dto/climate.dto';
import type { CoolingEstimateDto } from '../estimates/dto/cooling-result.dto';
import type {
  HeatingConditionsUsedDto,
  HeatingEstimateDto,
  HouseHeatingEstimateDto,
} from '../estimates/dto/heating-result.dto';
import type { HouseDto } from '../houses/dto/house.dto';
import type { HouseSeasonEstimateDto, SeasonEstimateDto, SeasonInputsUsedDto } from '../season/dto/season-result.dto';
import type { SideBySideColumnDto } from '../side-by-side/dto/side-by-side.dto';

/**
 * One column of the alternatives a report compares: the side-by-side's column (same names, same
 * numbers) with only the parts the report shows.
 */
export interface ReportAlternativeColumn extends Pick<
  SideBySideColumnDto,
  'key' | 'alternativeId' | 'name' | 'changedFields' | 'ownCalendar' | 'costAmount' | 'invalid' | 'versusHouse'
> {
  heating: Pick<HeatingEstimateDto, 'heatLoss' | 'heater' | 'cautions'> | null;
  cooling: Pick<CoolingEstimateDto, 'capacity'> | null;
  season: Pick<SeasonEstimateDto, 'period' | 'fuel' | 'total' | 'cautions'> | null;
}

/** The house and its saved alternatives side by side, as they were when the report was taken. */
export type ReportAlternatives =
  | {
      status: 'compared';
      /** alternatives the house had; the newest (at most MAX_COMPARED_ALTERNATIVES) are compared */
      savedCount: number;
      /** the house as it was first, then each alternative compared, oldest first */
      columns: ReportAlternativeColumn[];
      heatingConditionsUsed: HeatingConditionsUsedDto;
      seasonInputsUsed: SeasonInputsUsedDto;
    }
  | { status: 'none' }
  | { status: 'not-available'; savedCount: number; reason: string };

/** Everything a report shows, copied when it is saved: later edits to the house, the farm, its
 * climate or the reference data never change it. */
export interface ReportSnapshot {
  version: 1;
  takenAt: string;
  farm: {
    id: number;
    name: string;
    latitudeDeg: number;
    longitudeDeg: number;
    elevationM: number;
    timeZone: string;
    /** ISO 4217; absent in reports saved before farms had a currency (they were in US dollars) */
    currency?: string;
  };
  house: HouseDto;
  climate: SiteClimateDto | null;
  /** the design-night estimate with its conditions, where each came from, assumptions and cautions */
  heating: HouseHeatingEstimateDto;
  /** the season's fuel and cost, or why there is none (e.g. no fuel price on the farm) */
  season:
    | {
        status: 'estimated';
        estimate: Pick<
          HouseSeasonEstimateDto,
          'period' | 'fuel' | 'total' | 'heaterCapacity' | 'assumptions' | 'cautions' | 'inputsUsed'
        >;
      }
    | { status: 'not-available'; reason: string };
  /**
   * The house's saved alternatives compared with it (the side-by-side's numbers); absent in
   * reports saved before reports compared alternatives, which show no such section.
   */
  alternatives?: ReportAlternatives;
}

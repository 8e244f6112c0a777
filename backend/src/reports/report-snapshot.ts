import type { SiteClimateDto } from '../climate/dto/climate.dto';
import type { HouseHeatingEstimateDto } from '../estimates/dto/heating-result.dto';
import type { HouseDto } from '../houses/dto/house.dto';
import type { HouseSeasonEstimateDto } from '../season/dto/season-result.dto';

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
}

import { Injectable } from '@nestjs/common';
import { patchedPaths } from '@thermbay/engine/alternatives/house-patch';
import { compareSideBySide, type SideBySideColumnInput } from '@thermbay/engine/alternatives/side-by-side';
import { EngineInputError } from '@thermbay/engine/errors';
import type { HouseSpec } from '@thermbay/engine/house.types';
import type { ProductionCalendar } from '@thermbay/engine/season/production-calendar';
import { AlternativesService } from '../alternatives/alternatives.service';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import type { HeatingConditionsUsedDto } from '../estimates/dto/heating-result.dto';
import { EstimatesService } from '../estimates/estimates.service';
import { houseToSpec } from '../houses/house.mapper';
import { HousesService } from '../houses/houses.service';
import type { House } from '../houses/models/house.model';
import { ReferenceDataService } from '../reference-data/reference-data.service';
import type { FarmFuelPrice } from '../season/models/farm-fuel-price.model';
import { SeasonInputsService, withRequestFields, type FarmSeasonContext } from '../season/season-inputs.service';
import { SeasonService, type PreparedSeasonRun } from '../season/season.service';
import { SunCacheService } from '../season/sun-cache.service';
import {
  MAX_COMPARED_ALTERNATIVES,
  type SideBySideColumnDto,
  type SideBySideDto,
  type SideBySideRequestDto,
} from './dto/side-by-side.dto';

interface ColumnSetup {
  input: SideBySideColumnInput;
  heatingConditionsUsed: HeatingConditionsUsedDto;
  season: PreparedSeasonRun;
}

/**
 * The house and up to four of its alternatives, each through the same heating, cooling and season
 * estimates the house gets on its own, with the farm's climate, prices and the house's calendar
 * (unless the alternative brings its own). Nothing is cached: every call reads the house and farm.
 */
@Injectable()
export class SideBySideService {
  constructor(
    private readonly houses: HousesService,
    private readonly alternatives: AlternativesService,
    private readonly estimates: EstimatesService,
    private readonly season: SeasonService,
    private readonly inputs: SeasonInputsService,
    private readonly reference: ReferenceDataService,
    private readonly sun: SunCacheService,
  ) {}

  async compare(user: AuthenticatedUser, houseId: number, body: SideBySideRequestDto): Promise<SideBySideDto> {
    const stored = await this.houses.loadFor(user, houseId, 'estimate:run');
    return this.compareStored(stored, body);
  }

  /**
   * `compare` for a house the caller has loaded already (a report being taken): the same
   * estimate:run check on the house's farm, then the same columns from the same code.
   */
  async compareLoaded(user: AuthenticatedUser, stored: House, body: SideBySideRequestDto): Promise<SideBySideDto> {
    await this.houses.requireOn(user, stored, 'estimate:run');
    return this.compareStored(stored, body);
  }

  /**
   * The alternatives set beside the house when nobody chose them: the newest
   * MAX_COMPARED_ALTERNATIVES, in the order the alternatives list shows them (oldest first), as the
   * list's "Compare side by side" link picks them; and how many the house has. The caller has
   * checked access to the house.
   */
  async newestAlternativeIds(house: House): Promise<{ ids: number[]; savedCount: number }> {
    const all = await this.alternatives.idsInListOrder(house.id);
    return { ids: all.slice(-MAX_COMPARED_ALTERNATIVES), savedCount: all.length };
  }

  private async compareStored(stored: House, body: SideBySideRequestDto): Promise<SideBySideDto> {
    const houseId = stored.id;
    const resolved = await this.alternatives.resolveMany(stored, body.alternativeIds ?? []);
    const now = new Date();
    const farm = await this.inputs.farm(stored.farmId);
    const shared = {
      context: await this.inputs.farmContext(farm, body, now),
      prices: await this.inputs.pricesOf(farm.id),
    };

    const house = await this.setup(stored, houseToSpec(stored), undefined, null, body, shared, now);
    const altSetups: Array<ColumnSetup | { field: string; message: string }> = [];
    for (const alt of resolved) {
      if (!alt.house) {
        altSetups.push(alt.invalid as { field: string; message: string });
        continue;
      }
      try {
        const calendar = this.alternatives.engineCalendar(alt.row.calendar);
        altSetups.push(
          await this.setup(stored, houseToSpec(alt.house), calendar, alt.row.costAmount, body, shared, now),
        );
      } catch (error) {
        if (!(error instanceof EngineInputError)) throw error;
        altSetups.push({ field: error.field, message: error.message });
      }
    }
    const computable = altSetups.filter((s): s is ColumnSetup => 'input' in s);
    const result = withRequestFields(() =>
      compareSideBySide(
        house.input,
        computable.map((s) => s.input),
        this.reference.data,
        this.sun.cache,
      ),
    );

    const columns: SideBySideColumnDto[] = [
      {
        key: 'house',
        alternativeId: null,
        name: stored.name,
        changedFields: [],
        ownCalendar: false,
        costAmount: null,
        invalid: null,
        heating: result.house.heating,
        cooling: result.house.cooling,
        season: result.house.season,
        light: result.house.light,
        versusHouse: null,
      },
    ];
    let next = 0;
    resolved.forEach((alt, index) => {
      const setup = altSetups[index];
      const base = {
        key: `alternative-${alt.row.id}`,
        alternativeId: alt.row.id,
        name: alt.row.name,
        changedFields: patchedPaths(alt.row.patch),
        ownCalendar: alt.row.calendar !== null,
        costAmount: alt.row.costAmount ?? null,
      };
      const empty = { heating: null, cooling: null, season: null, light: null, versusHouse: null };
      if (!('input' in setup)) {
        columns.push({ ...base, ...empty, invalid: { field: setup.field, message: setup.message } });
        return;
      }
      const outcome = result.alternatives[next++];
      if (!outcome.ok) {
        columns.push({ ...base, ...empty, invalid: { field: outcome.field, message: outcome.message } });
        return;
      }
      const { column } = outcome;
      columns.push({
        ...base,
        invalid: null,
        heating: column.heating,
        cooling: column.cooling,
        season: column.season,
        light: column.light,
        versusHouse: column.versusHouse,
      });
    });
    return {
      houseId,
      houseName: stored.name,
      columns,
      heatingConditionsUsed: house.heatingConditionsUsed,
      seasonInputsUsed: house.season.inputsUsed,
    };
  }

  private async setup(
    stored: House,
    house: HouseSpec,
    calendar: ProductionCalendar | null | undefined,
    costMoney: number | null,
    body: SideBySideRequestDto,
    shared: { context: FarmSeasonContext; prices: Map<string, FarmFuelPrice> },
    now: Date,
  ): Promise<ColumnSetup> {
    const heating = await this.estimates.heatingSetup(stored.farmId, house);
    const cooling = await this.estimates.coolingSetup(stored.farmId, house, {}, now);
    const season = await this.season.prepareFor(stored, house, calendar, body, shared);
    return {
      input: { heating: heating.input, cooling: cooling.input, season: season.input, costMoney },
      heatingConditionsUsed: heating.conditionsUsed,
      season,
    };
  }
}

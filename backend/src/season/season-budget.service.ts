import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { estimateSeason } from '@thermbay/engine/estimate-season';
import { fuelRow } from '@thermbay/engine/season/fuel';
import { FarmAccessService } from '../farms/farm-access.service';
import { houseToSpec } from '../houses/house.mapper';
import { House } from '../houses/models/house.model';
import { ReferenceDataService } from '../reference-data/reference-data.service';
import type { SeasonBudgetRequestDto } from './dto/season-request.dto';
import type { BudgetFuelTotalDto, BudgetHouseDto, BudgetMonthDto, SeasonBudgetDto } from './dto/season-budget.dto';
import { SeasonInputsService, withRequestFields } from './season-inputs.service';
import { SunCacheService } from './sun-cache.service';
import { budgetBasis, HeatLossBasisService } from './heat-loss-basis.service';

/**
 * The farm's season fuel budget: every house's season (its own fuel, heater efficiency and
 * production calendar, the farm's price) on one climate and one set of dates, summed by fuel
 * and by month. A house without heaters or without a price stays in the list with its problem
 * named, and out of the cost total.
 */
@Injectable()
export class SeasonBudgetService {
  constructor(
    @InjectModel(House) private readonly houses: typeof House,
    private readonly access: FarmAccessService,
    private readonly inputs: SeasonInputsService,
    private readonly reference: ReferenceDataService,
    private readonly sun: SunCacheService,
    private readonly basis: HeatLossBasisService,
  ) {}

  async budget(user: AuthenticatedUser, farmId: number, request: SeasonBudgetRequestDto): Promise<SeasonBudgetDto> {
    await this.access.require(user, farmId, 'farm:read');
    const farm = await this.inputs.farm(farmId);
    const context = await this.inputs.farmContext(farm, request, new Date());
    const prices = await this.inputs.pricesOf(farmId);
    const rows = await this.houses.findAll({
      where: { farmId },
      order: [
        ['name', 'ASC'],
        ['id', 'ASC'],
      ],
    });
    const ref = this.reference.data;
    const basis = await this.basis.forFarm(farmId, request.heatLossBasis);
    const basisUsed = rows.map((row) => ({ name: row.name, basis: basis.forHouse(row.id, row.name, row.version) }));

    const houses: BudgetHouseDto[] = [];
    const cautions = new Set<string>();
    for (const [index, row] of rows.entries()) {
      const house = houseToSpec(row);
      const used = basisUsed[index].basis;
      const calendar = await this.inputs.calendarOf(row.id);
      const heater = house.heaters[0];
      if (!heater) {
        houses.push(
          emptyHouse(row, calendar?.length ?? 0, 'the house has no heaters, so it burns no fuel in this budget', used),
        );
        continue;
      }
      const stored = prices.get(heater.fuelId);
      const fuel = fuelRow(ref, heater.fuelId, `houses.${row.id}.heaters.0.fuelId`);
      // Without a price the quantities are still worth showing; the engine leaves the cost empty.
      const price = stored
        ? { fuelId: heater.fuelId, pricePerUnit: stored.pricePerUnit, priceUnit: stored.priceUnit }
        : { fuelId: heater.fuelId, pricePerUnit: null, priceUnit: 'si' as const };
      const estimate = withRequestFields(() =>
        estimateSeason(
          {
            house,
            site: context.site,
            climate: context.climate,
            season: context.season,
            calendar,
            fuel: price,
            heaterEfficiency: heater.efficiency,
            heatLossFactor: used.heatLossBasis === 'calibrated' ? used.heatLossFactor : undefined,
          },
          ref,
          this.sun.cache,
        ),
      );
      estimate.cautions.forEach((caution) => cautions.add(caution));
      houses.push({
        houseId: row.id,
        name: row.name,
        heatLossBasis: used.heatLossBasis,
        heatLossFactor: used.heatLossFactor,
        fuelId: fuel.id,
        fuelLabel: fuel.label,
        unitSi: fuel.unitSi,
        unitUs: fuel.unitUs,
        heaterEfficiency: heater.efficiency,
        pricePerUnit: stored ? stored.pricePerUnit : null,
        priceUnit: stored ? stored.priceUnit : null,
        energyKWh: estimate.total.energyKWh,
        fuelInputKWh: estimate.total.fuelInputKWh,
        fuelQuantitySi: estimate.total.fuelQuantitySi,
        fuelQuantityUs: estimate.total.fuelQuantityUs,
        cost: estimate.total.cost,
        unmetHeatKWh: estimate.total.unmetHeatKWh,
        hoursBelowSetpoint: estimate.total.hoursBelowSetpoint,
        capacityCaution: estimate.heaterCapacity.caution,
        heatedDays: estimate.period.heatedDays,
        calendarPeriodCount: calendar?.length ?? 0,
        monthly: estimate.monthly.map((month) => ({
          year: month.year,
          month: month.month,
          energyKWh: month.energyKWh,
          fuelInputKWh: month.fuelInputKWh,
          fuelQuantitySi: month.fuelQuantitySi,
          fuelQuantityUs: month.fuelQuantityUs,
          cost: month.cost,
          unmetHeatKWh: month.unmetHeatKWh,
          hoursBelowSetpoint: month.hoursBelowSetpoint,
        })),
        problem: stored ? null : `No price for ${fuel.label} yet: enter it to include this house's cost`,
      });
    }

    const byFuel = new Map<string, BudgetFuelTotalDto>();
    const monthly = new Map<string, BudgetMonthDto>();
    for (const house of houses) {
      if (!house.fuelId) continue;
      const fuel = fuelRow(ref, house.fuelId);
      const total = byFuel.get(house.fuelId) ?? {
        fuelId: fuel.id,
        label: fuel.label,
        unitSi: fuel.unitSi,
        unitUs: fuel.unitUs,
        houseCount: 0,
        energyKWh: 0,
        fuelInputKWh: 0,
        fuelQuantitySi: 0,
        fuelQuantityUs: 0,
        cost: 0,
      };
      total.houseCount++;
      total.energyKWh += house.energyKWh;
      total.fuelInputKWh += house.fuelInputKWh;
      total.fuelQuantitySi += house.fuelQuantitySi;
      total.fuelQuantityUs += house.fuelQuantityUs;
      total.cost = total.cost === null || house.cost === null ? null : total.cost + house.cost;
      byFuel.set(house.fuelId, total);
      for (const month of house.monthly) {
        const key = `${month.year}-${month.month}`;
        const entry = monthly.get(key) ?? {
          year: month.year,
          month: month.month,
          energyKWh: 0,
          fuelInputKWh: 0,
          cost: null,
          byFuel: [],
        };
        entry.energyKWh += month.energyKWh;
        entry.fuelInputKWh += month.fuelInputKWh;
        if (month.cost !== null) entry.cost = (entry.cost ?? 0) + month.cost;
        let fuelEntry = entry.byFuel.find((item) => item.fuelId === house.fuelId);
        if (!fuelEntry) {
          fuelEntry = { fuelId: house.fuelId, fuelQuantitySi: 0, fuelQuantityUs: 0 };
          entry.byFuel.push(fuelEntry);
        }
        fuelEntry.fuelQuantitySi += month.fuelQuantitySi;
        fuelEntry.fuelQuantityUs += month.fuelQuantityUs;
        monthly.set(key, entry);
      }
    }

    const costComplete = houses.every((house) => house.cost !== null);
    const notes = [
      "Each house is estimated with its first heater's fuel and efficiency, its production calendar and the farm's price for that fuel.",
      'Heat is delivered heat; fuel burnt = heat ÷ heater efficiency. In an hour that needs more than the installed heaters give, only their output is delivered.',
    ];
    if (houses.some((house) => house.hoursBelowSetpoint > 0)) {
      notes.push('Some houses cannot be held at their setpoints in the coldest hours; see each house’s heater sizing.');
    }
    if (!costComplete) notes.push('Some houses have no heaters or no fuel price; their cost is left out of the total.');
    if (houses.length === 0) notes.push('The farm has no houses yet.');

    const basisStatement = budgetBasis(basis, basisUsed);
    notes.unshift(basisStatement.heatLossBasisStatement);
    return {
      ...basisStatement,
      farmId,
      startDate: context.season.startDate,
      endDate: context.season.endDate,
      seasonFrom: context.seasonFrom,
      climateSource: context.log ? 'temperature-log' : 'normals',
      temperatureLogId: context.log?.id ?? null,
      houses,
      byFuel: [...byFuel.values()],
      totalEnergyKWh: houses.reduce((sum, house) => sum + house.energyKWh, 0),
      totalCost: houses.some((house) => house.cost !== null)
        ? houses.reduce((sum, house) => sum + (house.cost ?? 0), 0)
        : null,
      currency: farm.currency,
      costComplete,
      monthly: [...monthly.values()].sort((a, b) => a.year - b.year || a.month - b.month),
      notes,
      cautions: [...cautions],
    };
  }
}

function emptyHouse(
  row: House,
  calendarPeriodCount: number,
  problem: string,
  used: { heatLossBasis: BudgetHouseDto['heatLossBasis']; heatLossFactor: number },
): BudgetHouseDto {
  return {
    houseId: row.id,
    name: row.name,
    heatLossBasis: used.heatLossBasis,
    heatLossFactor: used.heatLossFactor,
    fuelId: null,
    fuelLabel: null,
    unitSi: null,
    unitUs: null,
    heaterEfficiency: null,
    pricePerUnit: null,
    priceUnit: null,
    energyKWh: 0,
    fuelInputKWh: 0,
    fuelQuantitySi: 0,
    fuelQuantityUs: 0,
    cost: null,
    unmetHeatKWh: 0,
    hoursBelowSetpoint: 0,
    capacityCaution: null,
    heatedDays: 0,
    calendarPeriodCount,
    monthly: [],
    problem,
  };
}

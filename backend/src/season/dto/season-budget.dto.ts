import { ApiProperty } from '@nestjs/swagger';
import { BudgetHeatLossBasisDto, HEAT_LOSS_BASES, type HeatLossBasis } from './heat-loss-basis.dto';
import type { PriceUnit } from '@thermbay/engine/season/fuel';
import { PRICE_UNITS } from './season-request.dto';
import { PROSE_TOKENS_NOTE } from '@thermbay/engine/vocabulary';

export class BudgetMonthOfHouseDto {
  @ApiProperty() year: number;
  @ApiProperty({ minimum: 1, maximum: 12 }) month: number;
  @ApiProperty({ description: 'heat delivered, kWh' }) energyKWh: number;
  @ApiProperty({ description: 'fuel burnt, kWh' }) fuelInputKWh: number;
  @ApiProperty() fuelQuantitySi: number;
  @ApiProperty() fuelQuantityUs: number;
  @ApiProperty({ type: Number, nullable: true, description: 'null when the farm has no price for the fuel' }) cost:
    number | null;
  @ApiProperty({ minimum: 0, description: 'heat the heaters could not deliver, kWh' }) unmetHeatKWh: number;
  @ApiProperty({ minimum: 0, description: 'hours in which the heaters could not hold the setpoint' })
  hoursBelowSetpoint: number;
}

export class BudgetHouseDto {
  @ApiProperty({ enum: HEAT_LOSS_BASES, description: 'the heat-loss basis this house was estimated on' })
  heatLossBasis: HeatLossBasis;
  @ApiProperty({ description: 'multiplier applied to its heat-loss coefficient (1 on the handbook basis)' })
  heatLossFactor: number;
  @ApiProperty() houseId: number;
  @ApiProperty() name: string;
  @ApiProperty({
    type: String,
    nullable: true,
    description: 'fuel of the first heater; null when the house has no heaters',
  })
  fuelId: string | null;
  @ApiProperty({ type: String, nullable: true }) fuelLabel: string | null;
  @ApiProperty({ type: String, nullable: true }) unitSi: string | null;
  @ApiProperty({ type: String, nullable: true }) unitUs: string | null;
  @ApiProperty({ type: Number, nullable: true }) heaterEfficiency: number | null;
  @ApiProperty({ type: Number, nullable: true }) pricePerUnit: number | null;
  @ApiProperty({ enum: PRICE_UNITS, nullable: true }) priceUnit: PriceUnit | null;
  @ApiProperty({ description: 'heat delivered, kWh' }) energyKWh: number;
  @ApiProperty({ description: 'fuel burnt, kWh' }) fuelInputKWh: number;
  @ApiProperty({ description: "in the fuel's unitSi" }) fuelQuantitySi: number;
  @ApiProperty({ description: "in the fuel's unitUs" }) fuelQuantityUs: number;
  @ApiProperty({ type: Number, nullable: true, description: 'null when the farm has no price for the fuel' }) cost:
    number | null;
  @ApiProperty() heatedDays: number;
  @ApiProperty({ description: "periods of the house's production calendar (0 = heated all season)" })
  calendarPeriodCount: number;
  @ApiProperty({ minimum: 0, description: "heat the house's heaters could not deliver, kWh" }) unmetHeatKWh: number;
  @ApiProperty({ minimum: 0, description: 'hours in which the heaters could not hold the setpoint' })
  hoursBelowSetpoint: number;
  @ApiProperty({
    type: String,
    nullable: true,
    description: `set when the heaters cannot hold the setpoint in some hour; ${PROSE_TOKENS_NOTE}`,
  })
  capacityCaution: string | null;
  @ApiProperty({ type: BudgetMonthOfHouseDto, isArray: true }) monthly: BudgetMonthOfHouseDto[];
  @ApiProperty({
    type: String,
    nullable: true,
    description: 'why the house is not (fully) budgeted, e.g. no heaters or no price',
  })
  problem: string | null;
}

export class BudgetFuelTotalDto {
  @ApiProperty() fuelId: string;
  @ApiProperty() label: string;
  @ApiProperty() unitSi: string;
  @ApiProperty() unitUs: string;
  @ApiProperty() houseCount: number;
  @ApiProperty({ description: 'kWh' }) energyKWh: number;
  @ApiProperty({ description: 'kWh' }) fuelInputKWh: number;
  @ApiProperty() fuelQuantitySi: number;
  @ApiProperty() fuelQuantityUs: number;
  @ApiProperty({ type: Number, nullable: true, description: 'null when the farm has no price for the fuel' }) cost:
    number | null;
}

export class BudgetMonthFuelDto {
  @ApiProperty() fuelId: string;
  @ApiProperty() fuelQuantitySi: number;
  @ApiProperty() fuelQuantityUs: number;
}

export class BudgetMonthDto {
  @ApiProperty() year: number;
  @ApiProperty({ minimum: 1, maximum: 12 }) month: number;
  @ApiProperty({ description: 'heat delivered to all houses, kWh' }) energyKWh: number;
  @ApiProperty({ description: 'kWh' }) fuelInputKWh: number;
  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'cost of the houses with a price; null when no house of the month has one',
  })
  cost: number | null;
  @ApiProperty({ type: BudgetMonthFuelDto, isArray: true }) byFuel: BudgetMonthFuelDto[];
}

export class SeasonBudgetDto extends BudgetHeatLossBasisDto {
  @ApiProperty() farmId: number;
  @ApiProperty() startDate: string;
  @ApiProperty() endDate: string;
  @ApiProperty({ enum: ['request', 'default-heating-season', 'temperature-log'] }) seasonFrom:
    'request' | 'default-heating-season' | 'temperature-log';
  @ApiProperty({ enum: ['normals', 'temperature-log'] }) climateSource: 'normals' | 'temperature-log';
  @ApiProperty({ type: Number, nullable: true }) temperatureLogId: number | null;
  @ApiProperty({ type: BudgetHouseDto, isArray: true }) houses: BudgetHouseDto[];
  @ApiProperty({ type: BudgetFuelTotalDto, isArray: true }) byFuel: BudgetFuelTotalDto[];
  @ApiProperty({ description: 'heat delivered to all houses, kWh' }) totalEnergyKWh: number;
  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'sum of the priced houses; null when no house has a price',
  })
  totalCost: number | null;
  @ApiProperty({ example: 'USD', description: "the farm's currency (ISO 4217) every amount is in" }) currency: string;
  @ApiProperty({ description: 'false when some house has no price (or no heaters) and is left out of totalCost' })
  costComplete: boolean;
  @ApiProperty({ type: BudgetMonthDto, isArray: true }) monthly: BudgetMonthDto[];
  @ApiProperty({ type: String, isArray: true, description: PROSE_TOKENS_NOTE }) notes: string[];
  @ApiProperty({ type: String, isArray: true, description: PROSE_TOKENS_NOTE }) cautions: string[];
}

import type { HouseSpec } from '../house.types';
import type { HeatLossComponentKey } from '../heating/heat-loss';
import type { Confidence } from '../vocabulary';
import type { ReferenceRow } from '../reference-data.types';
import type { SiteClimate } from '../climate/site-climate';
import type { FuelPrice, FuelRow, PriceUnit } from './fuel';
import type { HouseThermal } from './house-heat-loss';
import type { ProductionCalendar } from './production-calendar';
import type { SeasonRange, TemperatureReading } from './season-hours';
import type { SeasonHours, SimulationParameters, SimulationResult } from './season-simulation';
import type { SeasonLampSchedule } from './season-lamps';

/** The season estimate's input, its result, and the prepared season the measures share. */
// ---------------------------------------------------------------------------------------------
// Input

/** The farm as the season needs it. */
export interface SeasonSite {
  latitudeDeg: number;
  longitudeDeg: number;
  elevationM: number;
  /**
   * Fixed offset of local standard time from UTC, hours (the API derives it from the farm's IANA
   * zone). Daylight saving time is ignored: all hours are local standard time.
   */
  utcOffsetHours: number;
}

/** Logged temperatures instead of normals; `resolution` is inferred from the times when absent. */
export interface LoggedClimateInput {
  readings: TemperatureReading[];
  resolution?: 'hourly' | 'daily';
  /** clearness by month (index 0 = January) to use with a log; defaults from reference data */
  clearnessByMonth?: number[];
}

export interface EstimateSeasonInput {
  house: HouseSpec;
  site: SeasonSite;
  climate: SiteClimate | LoggedClimateInput;
  /** the heating season or a year, inclusive dates, at most 366 days */
  season: SeasonRange;
  /** heated and empty periods; without it every day of the season is heated to the house's setpoints */
  calendar?: ProductionCalendar | null;
  fuel: FuelPrice;
  /** steady-state heater efficiency, 0.3–1.05 (output = input × efficiency) */
  heaterEfficiency: number;
  /** replaces the reference share of transmitted sunlight that offsets heating, 0–1 */
  solarUsefulFraction?: number;
  /**
   * multiplies the house's heat-loss coefficients (coverings, perimeter and air leakage) and its
   * coupling to the night sky, e.g. a factor fitted to the farm's fuel bills; 1 (the handbook
   * values) when absent
   */
  heatLossFactor?: number;
}

// ---------------------------------------------------------------------------------------------
// Output

export type AssumptionConfidence = Confidence | 'user-entered';

export interface Assumption {
  key: string;
  label: string;
  value: number | string;
  unit: string;
  source: string;
  confidence: AssumptionConfidence;
  /** true where the user's own value replaced the reference value */
  overridden: boolean;
}

export interface FuelAmount {
  /** heat delivered to the house, kWh */
  energyKWh: number;
  /** heat content of the fuel burnt (energy ÷ efficiency), kWh */
  fuelInputKWh: number;
  /** fuel in its SI purchase unit (fuel.unitSi) */
  fuelQuantitySi: number;
  /** fuel in its US purchase unit (fuel.unitUs) */
  fuelQuantityUs: number;
  /** money, in the currency of the price; null when no price is known */
  cost: number | null;
}

export interface SeasonMonth extends FuelAmount {
  year: number;
  /** 1–12 */
  month: number;
  /** heated hours with any heat demand */
  heatingHours: number;
  /** highest hourly-average heat demand of the month, W */
  peakW: number;
  /** degree-days to the night setpoint, K·day */
  degreeDaysKDay: number;
  /** heat the installed heaters could not deliver, kWh */
  unmetHeatKWh: number;
  /** hours in which the heaters could not hold the setpoint */
  hoursBelowSetpoint: number;
  /** electricity the lamps use in the month, kWh (0 without lamps) */
  lampElectricityKWh: number;
  /** the part of it that ends as heat inside the house, kWh */
  lampHeatKWh: number;
  /** heat the heaters did not have to deliver because the lamps gave it, kWh */
  lampHeatSavedKWh: number;
}

/** What the house's supplemental lamps do over the season. */
export interface SeasonLamps {
  lampTypeId: string | null;
  /** the named lamp type's label, null when none is named */
  lampTypeLabel: string | null;
  powerDensityWPerM2: number;
  /** January to December */
  hoursPerDayByMonth: number[];
  heatToHouseFraction: number;
  /** electrical input of all the lamps while they run, W */
  electricW: number;
  /** heat they give the house while they run, W */
  heatW: number;
  /** electricity the lamps add over the season (heated days only), kWh */
  electricityKWh: number;
  /** the part of it that ends as heat inside the house, kWh */
  heatToHouseKWh: number;
  /** heat the heaters did not deliver because the lamps gave it, kWh (≤ heatToHouseKWh) */
  heatSavedKWh: number;
  /** the fuel (and money, with a price) that heat would have taken */
  fuelSaved: FuelAmount;
  /** heatSavedKWh ÷ heatToHouseKWh: the rest came when the house needed no heat (0 when the lamps never ran) */
  usefulShareOfHeat: number;
}

export interface DegreeDayStep {
  key: 'degree-day' | 'hourly-curve' | 'day-setpoint' | 'curtain' | 'sky' | 'sun' | 'lamps' | 'heater-capacity';
  label: string;
  energyKWh: number;
  /** change from the previous step, kWh */
  changeKWh: number;
}

export interface DegreeDayCrossCheck extends FuelAmount {
  /** the base each heated day is counted to; may hold {{kind:valueSI}} quantity tokens (see prose.ts) */
  baseDescription: string;
  /** the base when it is the same all season, else null, °C */
  baseTemperatureC: number | null;
  /** UA used (curtain open, the design condition), W/K */
  uaWPerK: number;
  degreeDaysKDay: number;
  degreeDaysFDay: number;
  /** hourly result ÷ degree-day result − 1 (null when the degree-day result is 0) */
  hourlyDifferenceFraction: number | null;
  /** from the degree-day figure to the hourly figure, one effect at a time (order matters) */
  steps: DegreeDayStep[];
  /** sentences that may hold {{kind:valueSI}} quantity tokens (see prose.ts) */
  explanation: string[]; /** the same method to the conventional 65 °F (18.3 °C) base, for comparison with published degree-days */
  conventionalBase: ConventionalBaseCheck;
}

export interface ConventionalBaseCheck extends FuelAmount {
  /** 18.333 °C (65 °F) */
  baseTemperatureC: number;
  /** degree-days of the heated days to that base, K·day */
  degreeDaysKDay: number;
  degreeDaysFDay: number;
  /** why the setpoint base is the one for a greenhouse, in one sentence */
  note: string;
  source: string;
}

export interface HeaterCapacity {
  /** Σ count × rated input × efficiency over the house's heater groups, W */
  installedOutputW: number;
  heaterCount: number;
  /** set when the heaters cannot hold the setpoint in some hour; may hold {{kind:valueSI}} tokens */
  caution: string | null;
}

export interface SeasonLossPart {
  /** the design night's component keys: roof, sidewalls, endwalls, kneewall, perimeter, infiltration, sky */
  key: HeatLossComponentKey;
  label: string;
  /** heat lost through this part over the heated hours that lose heat, kWh */
  energyKWh: number;
  /** share of all the heat lost, 0–1 */
  share: number;
}

/** Where the season's heat goes: Σ parts − solarOffsetKWh − unmetHeatKWh = deliveredKWh. */
export interface SeasonLossBreakdown {
  parts: SeasonLossPart[];
  /** Σ parts, kWh */
  lostKWh: number;
  /** the sky's part (also among the parts), kWh */
  skyKWh: number;
  /** heat the sun supplied in place of the heaters, kWh */
  solarOffsetKWh: number;
  /** heat the heaters could not deliver, kWh */
  unmetHeatKWh: number;
  /** heat delivered, kWh (the season's total) */
  deliveredKWh: number;
}

export interface SeasonEstimate {
  period: { startDate: string; endDate: string; days: number; heatedDays: number };
  fuel: {
    fuelId: string;
    label: string;
    unitSi: string;
    unitUs: string;
    /** null when no price is known (quantities only) */
    pricePerUnit: number | null;
    priceUnit: PriceUnit;
    /** the unit the price is per, e.g. 'US gal' */
    priceUnitLabel: string;
    heaterEfficiency: number;
  };
  heatLoss: { uaCurtainOpenWPerK: number; uaCurtainClosedWPerK: number; floorAreaM2: number };
  monthly: SeasonMonth[];
  total: FuelAmount & { heatingHours: number; unmetHeatKWh: number; hoursBelowSetpoint: number };
  /** what the house's heaters can deliver, and a caution when they fall short of the demand */
  heaterCapacity: HeaterCapacity;
  /** the hour of highest heat demand, null if no heat was needed */
  peak: { heatW: number; at: string; outdoorC: number } | null;
  /** share of the season's heat delivered at night (sunset to sunrise) */
  nightShareOfHeat: number;
  /** heat the sun supplied in place of the heater, kWh */
  solarOffsetKWh: number;
  /** the supplemental lamps' electricity, heat and the fuel their heat saves; null without lamps */
  lamps: SeasonLamps | null;
  /** the season's heat by part of the house, the night sky as its own part */
  lossBreakdown: SeasonLossBreakdown;
  degreeDays: DegreeDayCrossCheck;
  assumptions: Assumption[];
  cautions: string[];
}

// ---------------------------------------------------------------------------------------------
// Preparation shared with the measure comparison

export interface UsefulFractionRow extends ReferenceRow {
  fraction: number;
}

/** Everything about a season that does not depend on the house's variant. */
export interface PreparedSeason {
  input: EstimateSeasonInput;
  hours: SeasonHours;
  fuel: FuelRow;
  clearness: number[];
  clearnessFromUser: boolean;
  /** the climate's dew point by month (index 0 = January), null when the climate gives none */
  dewPointCByMonth: Array<number | null> | null;
  solarUsefulFraction: number;
  solarUsefulFractionRow: UsefulFractionRow;
  /** installed output of the house's heaters, W */
  heaterOutputW: number;
  heaterCount: number;
}

export interface SeasonVariant {
  house: HouseSpec;
  calendar: ProductionCalendar | null;
  season: SeasonRange;
  fuel: FuelPrice;
  fuelRow: FuelRow;
  heaterEfficiency: number;
  /** installed heater output the hourly simulation caps delivered heat at, W (0 without heaters) */
  heaterOutputW: number;
}

export interface VariantRun {
  thermal: HouseThermal;
  parameters: SimulationParameters;
  /** when the lamps run and what they use (null without lamps), even where the run left their heat out */
  lamps: SeasonLampSchedule | null;
  result: SimulationResult;
}

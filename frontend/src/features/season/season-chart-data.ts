import type { DegreeDayCrossCheck, HouseSeasonEstimate } from '../../api/types';
import type { Units } from '../../lib/units';

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

export interface SeasonChartSeries {
  labels: string[];
  /** fuel per month in the fuel's unit for the user's system */
  fuel: number[];
  fuelUnitLabel: string;
  /** heat delivered per month in the user's energy unit */
  heat: number[];
  heatUnitLabel: string;
}

/** The hourly season's months, oldest first, for the monthly bar chart. */
export function seasonChartSeries(
  season: Pick<HouseSeasonEstimate, 'monthly' | 'fuel'>,
  units: Units,
): SeasonChartSeries {
  const months = [...season.monthly].sort((a, b) => a.year - b.year || a.month - b.month);
  const energyDecimals = units.decimals('energyKWh');
  return {
    labels: months.map((month) => `${MONTHS[month.month - 1]} ${month.year}`),
    fuel: months.map((month) => Math.round(units.fuelValue(month) * 10) / 10),
    fuelUnitLabel: units.fuelUnit(season.fuel),
    heat: months.map((month) => Number(units.toDisplay('energyKWh', month.energyKWh).toFixed(energyDecimals))),
    heatUnitLabel: units.label('energyKWh'),
  };
}

export interface SeasonLossRow {
  key: string;
  label: string;
  /** heat in the user's energy unit, with the unit */
  heat: string;
  /** share of all the heat lost, or '' for the lines taken off it */
  share: string;
}

/**
 * Where the season's heat goes, in the user's units: each part of the house (the night sky its own
 * row), then the sun's offset and any heat the heaters could not deliver taken off, then the heat
 * delivered. The rows add up: parts − sun − unmet = delivered.
 */
export function seasonLossRows(
  breakdown: HouseSeasonEstimate['lossBreakdown'],
  units: Pick<Units, 'format'>,
): SeasonLossRow[] {
  const energy = (kWh: number) => units.format('energyKWh', kWh);
  const rows: SeasonLossRow[] = breakdown.parts.map((part) => ({
    key: part.key,
    label: part.label,
    heat: energy(part.energyKWh),
    share: units.format('fraction', part.share),
  }));
  rows.push({
    key: 'sun',
    label: 'Less: sunlight that offsets heating by day',
    heat: `−${energy(breakdown.solarOffsetKWh)}`,
    share: '',
  });
  if (breakdown.unmetHeatKWh > 0) {
    rows.push({
      key: 'unmet',
      label: 'Less: heat the heaters cannot deliver',
      heat: `−${energy(breakdown.unmetHeatKWh)}`,
      share: '',
    });
  }
  rows.push({ key: 'delivered', label: 'Heat delivered', heat: energy(breakdown.deliveredKWh), share: '' });
  return rows;
}

/** "12 % lower", "3 % higher", "the same" — the hourly result beside the degree-day one. */
export function hourlyVersusDegreeDayText(degreeDays: Pick<DegreeDayCrossCheck, 'hourlyDifferenceFraction'>): string {
  const fraction = degreeDays.hourlyDifferenceFraction;
  if (fraction === null) return 'The degree-day method finds no heat needed, so there is nothing to compare.';
  const percent = Math.round(Math.abs(fraction) * 100);
  if (percent === 0) return 'The hour-by-hour estimate and the degree-day estimate agree to within 1 %.';
  return `The hour-by-hour estimate is ${percent} % ${fraction < 0 ? 'lower' : 'higher'} than the degree-day estimate.`;
}

/**
 * The evening a night begins, for a local time within it: an hour before noon belongs to the
 * night that began the evening before ('2027-01-16T08:00' → '2027-01-15').
 */
export function nightStartDate(localTime: string): string {
  const [datePart = '', timePart = '00:00'] = localTime.split('T');
  const hour = Number(timePart.slice(0, 2));
  if (hour >= 12) return datePart;
  const [year, month, day] = datePart.split('-').map(Number) as [number, number, number];
  const previous = new Date(Date.UTC(year, month - 1, day - 1));
  return previous.toISOString().slice(0, 10);
}

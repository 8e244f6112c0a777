import type { SeasonBudget } from '../../api/types';
import type { Units } from '../../lib/units';

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

export interface BudgetChartSeries {
  /** 'Sep 2026' … */
  labels: string[];
  /** cost of the priced fuels per month, in the farm's currency; null where nothing is priced */
  cost: (number | null)[];
  /** heat delivered per month in the user's energy unit */
  heat: number[];
  heatUnitLabel: string;
}

/** The farm budget's months, oldest first, as bar-chart series. */
export function budgetChartSeries(budget: Pick<SeasonBudget, 'monthly'>, units: Units): BudgetChartSeries {
  const months = [...budget.monthly].sort((a, b) => a.year - b.year || a.month - b.month);
  const heatDecimals = units.decimals('energyKWh');
  return {
    labels: months.map((month) => `${MONTHS[month.month - 1]} ${month.year}`),
    cost: months.map((month) => (month.cost === null ? null : Math.round(month.cost * 100) / 100)),
    heat: months.map((month) => Number(units.toDisplay('energyKWh', month.energyKWh).toFixed(heatDecimals))),
    heatUnitLabel: units.label('energyKWh'),
  };
}

import { GUIDELINE_14_MONTHLY_LIMITS, type FitStatistics } from './fit-statistics';

/** The fit and the factor in plain words. */

function percent(value: number, digits = 1): string {
  return `${value.toFixed(digits)} %`;
}

export function describeFit(stats: FitStatistics, periodCount: number): string {
  const limits = `NMBE within ±${GUIDELINE_14_MONTHLY_LIMITS.nmbePercent} % and CV(RMSE) at most ${GUIDELINE_14_MONTHLY_LIMITS.cvRmsePercent} %`;
  const measured = `NMBE ${percent(stats.nmbePercent)}, CV(RMSE) ${percent(stats.cvRmsePercent)} over ${periodCount} bills`;
  if (stats.meetsMonthlyLimits) {
    return `The model with this factor meets ASHRAE Guideline 14's limits for monthly data (${limits}): ${measured}. The calibrated figures can be used for the budget.`;
  }
  const which: string[] = [];
  if (Math.abs(stats.nmbePercent) > GUIDELINE_14_MONTHLY_LIMITS.nmbePercent)
    which.push('over the bills together it is off on one side');
  if (stats.cvRmsePercent > GUIDELINE_14_MONTHLY_LIMITS.cvRmsePercent)
    which.push('bill by bill it misses by more than the guideline allows');
  return `The model with this factor does not meet ASHRAE Guideline 14's limits for monthly data (${limits}): ${measured}; ${which.join(', and ')}. Check the bills' dates and houses, the production calendar and the setpoints before relying on the factor.`;
}

export function describeFactor(factor: number, atLimit: boolean): string {
  if (atLimit) {
    return `The fit stopped at the edge of the range it searches (${factor.toFixed(2)}): the bills and the model disagree too much for one factor to explain. Check that each bill names the right houses and dates, and that the houses were heated as their calendars say.`;
  }
  const change = Math.round(Math.abs(factor - 1) * 100);
  if (change < 10) {
    return `The houses lose about as much heat as the handbook values assume (factor ${factor.toFixed(2)}, within 10 %).`;
  }
  if (factor > 1) {
    return `About ${change} % more heat loss than the handbook values assume — most often more air leakage than the class assumed (gaps at doors, vents, the base and torn film), or setpoints kept higher than entered.`;
  }
  return `About ${change} % less heat loss than the handbook values assume — often a tighter house than its air-leakage class, setpoints kept lower than entered, or heat from other sources (lights, a boiler room, compost).`;
}

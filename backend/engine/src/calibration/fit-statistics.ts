/**
 * Goodness of fit of a calibrated model as ASHRAE Guideline 14-2014 (Measurement of Energy,
 * Demand, and Water Savings) defines it:
 *   NMBE     = Σ(yᵢ − ŷᵢ) / ((n − p) · ȳ) × 100 %
 *   CV(RMSE) = √(Σ(yᵢ − ŷᵢ)² / (n − p)) / ȳ × 100 %
 * with y measured, ŷ modelled, ȳ the mean of the measured values, n the number of periods and
 * p the number of fitted parameters. For monthly data the guideline accepts a model whose NMBE
 * lies within ±5 % and whose CV(RMSE) is at most 15 %.
 */

export const GUIDELINE_14_MONTHLY_LIMITS = { nmbePercent: 5, cvRmsePercent: 15 } as const;

export interface FitStatistics {
  n: number;
  parameterCount: number;
  meanMeasured: number;
  nmbePercent: number;
  cvRmsePercent: number;
  /** |NMBE| ≤ 5 % and CV(RMSE) ≤ 15 % (the guideline's monthly limits) */
  meetsMonthlyLimits: boolean;
}

export function guideline14Statistics(measured: number[], modelled: number[], parameterCount: number): FitStatistics {
  const n = measured.length;
  if (modelled.length !== n) throw new RangeError('measured and modelled need the same number of values');
  if (n <= parameterCount) throw new RangeError('more values than fitted parameters are needed');
  let sum = 0;
  let residualSum = 0;
  let squaredSum = 0;
  for (let i = 0; i < n; i++) {
    sum += measured[i];
    const residual = measured[i] - modelled[i];
    residualSum += residual;
    squaredSum += residual * residual;
  }
  const meanMeasured = sum / n;
  if (!(meanMeasured > 0)) throw new RangeError('the measured values must have a positive mean');
  const dof = n - parameterCount;
  const nmbePercent = (residualSum / (dof * meanMeasured)) * 100;
  const cvRmsePercent = (Math.sqrt(squaredSum / dof) / meanMeasured) * 100;
  return {
    n,
    parameterCount,
    meanMeasured,
    nmbePercent,
    cvRmsePercent,
    meetsMonthlyLimits:
      Math.abs(nmbePercent) <= GUIDELINE_14_MONTHLY_LIMITS.nmbePercent &&
      cvRmsePercent <= GUIDELINE_14_MONTHLY_LIMITS.cvRmsePercent,
  };
}

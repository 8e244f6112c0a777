export interface WinterVentilation {
  fractionOfSummerRate: number;
  /** the summer rate the fraction is taken of: base rate × floor area × elevation factor, m³/s */
  summerBaseFlowM3PerS: number;
  flowM3PerS: number;
  airChangesPerHour: number;
  /** sensible heat to warm the ventilation air from outdoor to the night heating setpoint, W */
  heatCostW: number;
  atOutdoorC: number;
  /** the house's own loss through cover, perimeter and leaks at the same temperatures, W, for comparison */
  houseHeatLossW: number;
}

export interface WinterVentilationInput {
  fractionOfSummerRate: number;
  /**
   * the summer rate the fraction applies to: base rate × floor area × elevation factor only, m³/s.
   * The light, temperature-rise and short-house factors size fans for summer sun; applying them
   * here would push the winter stage above the 1.5–2.5 cfm/ft² the fraction stands for.
   */
  summerBaseFlowM3PerS: number;
  volumeM3: number;
  indoorC: number;
  outdoorC: number;
  airDensityKgPerM3: number;
  cpJPerKgK: number;
  /** the house's conductance (cover, perimeter, leaks), W/K */
  houseConductanceWPerK: number;
}

/**
 * The winter fan stage (a fraction of the summer base rate × elevation) and what running it costs in heat,
 * ρ·c_p·V̇·(T_i − T_o), beside the house's own loss at the same temperatures so the two can be weighed.
 */
export function winterVentilation(input: WinterVentilationInput): WinterVentilation {
  const flowM3PerS = input.fractionOfSummerRate * input.summerBaseFlowM3PerS;
  const deltaTK = Math.max(0, input.indoorC - input.outdoorC);
  return {
    fractionOfSummerRate: input.fractionOfSummerRate,
    summerBaseFlowM3PerS: input.summerBaseFlowM3PerS,
    flowM3PerS,
    airChangesPerHour: (flowM3PerS * 3600) / input.volumeM3,
    heatCostW: input.airDensityKgPerM3 * input.cpJPerKgK * flowM3PerS * deltaTK,
    atOutdoorC: input.outdoorC,
    houseHeatLossW: input.houseConductanceWPerK * deltaTK,
  };
}

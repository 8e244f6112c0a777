export interface WinterVentilation {
  fractionOfSummerRate: number;
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
  summerRequiredFlowM3PerS: number;
  volumeM3: number;
  indoorC: number;
  outdoorC: number;
  airDensityKgPerM3: number;
  cpJPerKgK: number;
  /** the house's conductance (cover, perimeter, leaks), W/K */
  houseConductanceWPerK: number;
}

/**
 * The winter fan stage (a fraction of the summer rate) and what running it costs in heat,
 * ρ·c_p·V̇·(T_i − T_o), beside the house's own loss at the same temperatures so the two can be weighed.
 */
export function winterVentilation(input: WinterVentilationInput): WinterVentilation {
  const flowM3PerS = input.fractionOfSummerRate * input.summerRequiredFlowM3PerS;
  const deltaTK = Math.max(0, input.indoorC - input.outdoorC);
  return {
    fractionOfSummerRate: input.fractionOfSummerRate,
    flowM3PerS,
    airChangesPerHour: (flowM3PerS * 3600) / input.volumeM3,
    heatCostW: input.airDensityKgPerM3 * input.cpJPerKgK * flowM3PerS * deltaTK,
    atOutdoorC: input.outdoorC,
    houseHeatLossW: input.houseConductanceWPerK * deltaTK,
  };
}

export interface WinterVentilation {
  fractionOfSummerRate: number;
  flowM3PerS: number;
  airChangesPerHour: number;
  /** sensible heat to warm the ventilation air from outdoor to the night heating setpoint, W */
  heatCostW: number;
  atOutdoorC: number;
}

export interface WinterVentilationInput {
  fractionOfSummerRate: number;
  summerRequiredFlowM3PerS: number;
  volumeM3: number;
  indoorC: number;
  outdoorC: number;
  airDensityKgPerM3: number;
  cpJPerKgK: number;
}

/** Minimum winter ventilation for humidity and its heat cost ρ·c_p·V̇·(T_i − T_o). */
export function winterVentilation(input: WinterVentilationInput): WinterVentilation {
  const flowM3PerS = input.fractionOfSummerRate * input.summerRequiredFlowM3PerS;
  return {
    fractionOfSummerRate: input.fractionOfSummerRate,
    flowM3PerS,
    airChangesPerHour: (flowM3PerS * 3600) / input.volumeM3,
    heatCostW: input.airDensityKgPerM3 * input.cpJPerKgK * flowM3PerS * Math.max(0, input.indoorC - input.outdoorC),
    atOutdoorC: input.outdoorC,
  };
}

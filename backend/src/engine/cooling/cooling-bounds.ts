/**
 * Bounds on the cooling inputs that the shared BOUNDS table does not cover (the API and UI may
 * import these too). Wide enough for any real design day; narrow enough that the physics holds.
 */
export const COOLING_BOUNDS = {
  dailyRangeK: { min: 0, max: 25 },
  /** wet bulb also may not exceed the design dry bulb */
  summerDesignWetBulbC: { min: 0, max: 40 },
  allowedTemperatureRiseK: { min: 1, max: 15 },
  /** 500–12,000 fc */
  peakInteriorLightLux: { min: 5_000, max: 130_000 },
  padToFanDistanceM: { min: 3, max: 300 },
  transpirationFraction: { min: 0, max: 0.9 },
  padAreaM2: { min: 0.1, max: 2_000 },
} as const;

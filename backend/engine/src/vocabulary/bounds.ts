/**
 * Bounds on what a user may type, shared by the API's DTOs and the UI's Yup schemas (the
 * frontend imports this file), so both sides refuse the same values. Wide enough for any real
 * commercial greenhouse; narrow enough that the physics stays meaningful.
 */
export const BOUNDS = {
  spans: { min: 1, max: 40 },
  widthM: { min: 2, max: 20 },
  lengthM: { min: 3, max: 300 },
  eaveHeightM: { min: 0.5, max: 10 },
  ridgeHeightM: { min: 1.5, max: 15 },
  uValueWPerM2K: { min: 0.2, max: 12 },
  airChangesPerHour: { min: 0.05, max: 10 },
  heaterCount: { min: 0, max: 50 },
  heaterGroups: { min: 0, max: 10 },
  nameLength: { min: 1, max: 120 },
  notesLength: { min: 0, max: 4000 },
  heaterInputW: { min: 500, max: 3_000_000 },
  heaterEfficiency: { min: 0.3, max: 1.05 },
  fanCount: { min: 0, max: 100 },
  fanCapacityM3PerS: { min: 0.1, max: 25 },
  inletAreaM2: { min: 0, max: 500 },
  /** also at most the eave height */
  kneewallHeightM: { min: 0, max: 3 },
  setpointC: { min: -5, max: 40 },
  designOutdoorC: { min: -50, max: 25 },
  summerDesignC: { min: 15, max: 55 },
  elevationM: { min: -100, max: 4500 },
  latitudeDeg: { min: -66, max: 66 },
  longitudeDeg: { min: -180, max: 180 },
  relativeHumidityPct: { min: 5, max: 100 },
  designWindSpeedMPerS: { min: 0, max: 25 },
  /** share of the sun a shade cloth passes (0 blocks all, 1 is no shade) */
  shadeClothTransmittance: { min: 0, max: 1 },
  /** calendar months a shade cloth may be in place: 1 = January … 12 = December */
  shadeClothMonth: { min: 1, max: 12 },
  /** electrical input of supplemental lamps per m² of floor (HPS about 70, LED about 45 for 100 µmol/(m²·s)) */
  lampPowerDensityWPerM2: { min: 1, max: 200 },
  /** each of the 12 monthly values */
  lampHoursPerDay: { min: 0, max: 24 },
  /** share of the lamps' input that heats the house; below one half would mean most of the light left the house */
  lampHeatToHouseFraction: { min: 0.5, max: 1 },
} as const;

/** Lamp hours are given for each month, January to December. */
export const LAMP_MONTHS = 12;

export type BoundName = keyof typeof BOUNDS;

/**
 * Bounds on the cooling inputs (design day, pads, light).
 * Wide enough for any real design day; narrow enough that the physics holds.
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

/** Outdoor temperatures the engine accepts anywhere, °C: colder or hotter air is a typing error. */
export const OUTDOOR_TEMPERATURE_LIMITS_C = { min: -60, max: 60 } as const;

/**
 * Bounds on a farm's climate. The summer design values feed the cooling estimate, so they are the
 * cooling bounds themselves: a climate the API saves is always one the cooling estimate accepts.
 */
export const CLIMATE_BOUNDS = {
  monthlyMeanC: OUTDOOR_TEMPERATURE_LIMITS_C,
  clearnessFraction: { min: 0, max: 1 },
  summerDesignWetBulbC: COOLING_BOUNDS.summerDesignWetBulbC,
  summerDailyRangeK: COOLING_BOUNDS.dailyRangeK,
  sourceNoteLength: { min: 0, max: 1000 },
} as const;

/**
 * Largest temperature log file the API reads: its size in bytes and its data rows. 200,000
 * rows hold more than twenty years of hourly readings; the UI states both before a file is chosen.
 */
export const TEMPERATURE_LOG_LIMITS = { maxBytes: 5 * 1024 * 1024, maxRows: 200_000 } as const;

/**
 * A greenhouse as the engine sees it. SI units throughout; names carry their unit.
 * The API's house DTOs and the stored house map onto this shape one to one.
 */
import type { HeaterType, HouseShape, SurfaceGroup } from './vocabulary';

export interface HeaterGroup {
  /** number of identical units */
  count: number;
  /** rated input of one unit, W (unit heaters are rated on input) */
  ratedInputW: number;
  /** steady-state efficiency, 0–1 (output = input × efficiency) */
  efficiency: number;
  /** id of a row in reference-data/fuels.json */
  fuelId: string;
  /**
   * what kind of heater (reference-data/heater-types.json): sets the efficiency the form offers
   * and the cautions; null or absent when not stated
   */
  heaterType?: HeaterType | null;
}

export interface ExhaustFans {
  count: number;
  /** air moved by one fan at the working static pressure, m³/s */
  capacityEachM3PerS: number;
}

export interface Setpoints {
  dayHeatingC: number;
  nightHeatingC: number;
  coolingC: number;
}

/**
 * A shade cloth (or screen) over the crop: the share of the sun it passes and the months it is in
 * place. Typical cloths are in reference-data/shade-cloths.json; the house keeps the figure itself.
 */
export interface ShadeCloth {
  /** share of the sun's radiation (heat and light alike) that passes the cloth, 0–1; a "50 % shade" cloth ≈ 0.5 */
  solarTransmittance: number;
  /** calendar months (1 = January … 12 = December) in which the cloth is in place, each once */
  months: number[];
}

/**
 * Supplemental lamps: electrical input per m² of floor, hours per day by month, and the share of
 * the input that ends as heat inside the house (reference-data/lamps.json).
 */
export interface Lamps {
  /** reference-data/lamps.json id of a lamp-type row, or null when not stated */
  lampTypeId?: string | null;
  /** installed electrical input per m² of floor, W/m² */
  powerDensityWPerM2: number;
  /** hours the lamps run per day, January to December: 12 values, 0–24 */
  hoursPerDayByMonth: number[];
  /** share of the electrical input that ends as heat inside the house, 0–1 */
  heatToHouseFraction: number;
}

export interface HouseSpec {
  shape: HouseShape;
  /** 1 for a freestanding house; more for a gutter-connected range */
  spans: number;
  /** width of one span, m */
  widthM: number;
  lengthM: number;
  /** sidewall (gutter) height, m */
  eaveHeightM: number;
  ridgeHeightM: number;
  /** reference-data/coverings.json ids per surface group */
  coverings: Record<SurfaceGroup, string>;
  /** a maker's U-value that replaces the reference value for a surface group, W/(m²·K) */
  coveringUOverridesWPerM2K?: Partial<Record<SurfaceGroup, number>>;
  /** reference-data/air-leakage.json id */
  airLeakageClassId: string;
  /** a measured air-change rate that replaces the leakage class's rate, 1/h */
  airChangesPerHourOverride?: number | null;
  perimeterInsulated: boolean;
  /**
   * height of the band at the foot of the sidewalls and endwalls that is (or would be) a kneewall,
   * m; 0 or absent for none. It is opaque only when `kneewallId` names a construction: without one
   * the glazing reaches the ground (and the insulation measure knows how high to build).
   */
  kneewallHeightM?: number | null;
  /** reference-data/kneewalls.json id of the kneewall's construction, or null for glazing to the ground */
  kneewallId?: string | null;
  /** reference-data/curtains.json id of a thermal curtain drawn at night, or null for none */
  curtainId?: string | null;
  /** a shade cloth in place in some months, or null / absent for none */
  shadeCloth?: ShadeCloth | null;
  heaters: HeaterGroup[];
  exhaustFans: ExhaustFans;
  /** free area of the intake louvres or inlets, m² */
  inletAreaM2: number;
  setpoints: Setpoints;
  /** supplemental lamps, or null / absent for none */
  lamps?: Lamps | null;
}

/** Where the house stands; used for air density and the sun's path. */
export interface Site {
  latitudeDeg: number;
  longitudeDeg: number;
  elevationM: number;
  timeZone: string;
}

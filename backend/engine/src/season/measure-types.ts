import type { HeaterType } from '../vocabulary';
import type { FuelPrice } from './fuel';
import type { FuelAmount } from './season-types';

/**
 * Energy measures compared by re-running the season for each variant of the house.
 * Savings are per season; with one heating season a year they are yearly savings. Simple
 * payback = cost ÷ yearly money saved; a measure that saves nothing never pays back.
 */

interface MeasureBase {
  /**
   * what the measure costs, entered by the user (same currency as the fuel price); undefined or
   * null when no cost has been entered yet (the payback then asks for one)
   */
  costMoney?: number | null;
  /** the user's own name for it */
  label?: string;
}

export type Measure =
  | (MeasureBase & { kind: 'second-poly-layer'; surfaces?: Array<'roof' | 'sidewalls'>; coveringId?: string })
  | (MeasureBase & { kind: 'thermal-curtain'; curtainId?: string })
  | (MeasureBase & {
      kind: 'perimeter-insulation';
      /** kneewalls.json id the kneewall is built of (default: 2 in foam board) */
      kneewallId?: string;
      /** kneewall height where the house gives none, m */
      kneewallHeightM?: number;
    })
  | (MeasureBase & { kind: 'sealing'; airLeakageClassId?: string; airChangesPerHour?: number })
  | (MeasureBase & { kind: 'night-setpoint-lower'; lowerByK?: number })
  | (MeasureBase & { kind: 'later-start'; delayDays?: number })
  | (MeasureBase & {
      kind: 'heater-efficiency';
      /** the kind of heater the units are replaced by; its typical efficiency applies unless `efficiency` is given */
      heaterType?: HeaterType;
      efficiency?: number;
    })
  | (MeasureBase & { kind: 'fuel-switch'; fuel?: FuelPrice; efficiency?: number });

export type MeasureKind = Measure['kind'];

export const MEASURE_KINDS: readonly MeasureKind[] = [
  'second-poly-layer',
  'thermal-curtain',
  'perimeter-insulation',
  'sealing',
  'night-setpoint-lower',
  'later-start',
  'heater-efficiency',
  'fuel-switch',
];

/**
 * How a measure's payback reads:
 * - 'years': cost ÷ yearly money saved (paybackYears > 0)
 * - 'immediate': a cost of 0 entered and money saved (paybackYears = 0)
 * - 'enter-cost': money saved but no cost entered yet (paybackYears null)
 * - 'enter-price': fuel saved but no fuel price known, so no money figure (paybackYears null)
 * - 'never': it saves no money (paybackYears null)
 * - 'not-applicable': the measure changes nothing for this house (paybackYears null)
 */
export type PaybackStatus = 'years' | 'immediate' | 'enter-cost' | 'enter-price' | 'never' | 'not-applicable';
export const PAYBACK_STATUSES: readonly PaybackStatus[] = [
  'years',
  'immediate',
  'enter-cost',
  'enter-price',
  'never',
  'not-applicable',
];

export interface LightChange {
  /** which surface's light the figures describe ('kneewall': the whole envelope's, a kneewall being opaque) */
  surface: 'roof' | 'sidewalls' | 'kneewall';
  before: number;
  after: number;
  /** relative change of light reaching the crop, e.g. −0.11 for 11 % less */
  relativeChange: number;
  source: string;
}

export interface MeasureResult {
  /** position in the input list */
  index: number;
  kind: MeasureKind;
  label: string;
  /** what changed, in words; may hold {{kind:valueSI}} quantity tokens (see ../prose.ts) */
  description: string;
  /** null when no cost was entered */
  costMoney: number | null;
  /** false when the measure would change nothing for this house (already done, or no better) */
  applicable: boolean;
  /** why it does not apply, in plain words (may hold quantity tokens); null when it applies */
  notApplicableReason: string | null;
  /** the variant's season (the house as it is for a measure that does not apply) */
  season: FuelAmount & { fuelId: string; unitSi: string; unitUs: string };
  /** heat the house no longer needs, kWh per season (0 for heater or fuel changes) */
  heatSavedKWh: number;
  /** fuel energy no longer bought, kWh per season */
  fuelInputSavedKWh: number;
  /** fuel saved in the baseline fuel's units; null when the variant burns another fuel */
  fuelSavedSi: number | null;
  fuelSavedUs: number | null;
  /** money saved per season (= per year with one season a year); null without a fuel price */
  yearlyMoneySaved: number | null;
  paybackStatus: PaybackStatus;
  /** cost ÷ yearly money saved when the status is 'years' or 'immediate' (0), else null */
  paybackYears: number | null;
  /** '2.4 years', 'immediately', 'enter a cost', 'enter the fuel price', 'never' or 'not applicable' */
  paybackText: string;
  /** change in light for measures that add a layer or a screen, else null */
  lightChange: LightChange | null;
  notes: string[];
}

export interface MeasureComparison {
  baseline: FuelAmount & { fuelId: string; unitSi: string; unitUs: string };
  /**
   * paying measures by payback, shortest first; then those without a cost; then those that never
   * pay back; measures that do not apply last
   */
  measures: MeasureResult[];
  notes: string[];
}

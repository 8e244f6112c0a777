import type { Setpoints } from '../house.types';
import { quantityToken } from '../vocabulary';

export interface FanStage {
  stage: number;
  /** indoor temperature at which this stage's fans switch on, °C */
  onAtC: number;
  /** fans that switch on at this stage (not cumulative) */
  fans: number;
}

export interface StagingResult {
  deadbandK: number;
  requiredDeadbandK: number;
  ok: boolean;
  /** may hold {{kind:valueSI}} quantity tokens (see ../prose.ts) */
  warnings: string[];
  stages: FanStage[];
}

export interface StagingPattern {
  requiredDeadbandK: number;
  /** share of the fans in the first stage, 0–1 */
  firstStageFraction: number;
  stageStepK: number;
  maxStages: number;
}

/**
 * Checks the gap between heating and cooling setpoints and suggests a fan staging: a first stage
 * of about `firstStageFraction` of the fans at the cooling setpoint, the rest split evenly over
 * the remaining stages, each `stageStepK` warmer.
 */
export function thermostatStaging(setpoints: Setpoints, fanCount: number, pattern: StagingPattern): StagingResult {
  const highestHeatingC = Math.max(setpoints.dayHeatingC, setpoints.nightHeatingC);
  const deadbandK = setpoints.coolingC - highestHeatingC;
  const ok = deadbandK >= pattern.requiredDeadbandK - 1e-9;
  const warnings: string[] = [];
  if (deadbandK <= 0) {
    warnings.push(
      `The cooling setpoint (${degC(setpoints.coolingC)}) is not above the heating setpoint (${degC(highestHeatingC)}): heaters and fans would run at the same time. Raise the cooling setpoint to at least ${degC(highestHeatingC + pattern.requiredDeadbandK)}.`,
    );
  } else if (!ok) {
    warnings.push(
      `The cooling setpoint is only ${kelvin(deadbandK)} above the heating setpoint; keep at least ${kelvin(pattern.requiredDeadbandK)} so heaters and fans do not run together (cooling setpoint ${degC(highestHeatingC + pattern.requiredDeadbandK)} or more).`,
    );
  }

  const stages: FanStage[] = [];
  if (fanCount > 0) {
    const firstStageFans = Math.min(fanCount, Math.max(1, Math.round(fanCount * pattern.firstStageFraction)));
    stages.push({ stage: 1, onAtC: setpoints.coolingC, fans: firstStageFans });
    let remaining = fanCount - firstStageFans;
    const laterStages = Math.max(1, pattern.maxStages - 1);
    for (let i = 0; i < laterStages && remaining > 0; i += 1) {
      const fans = Math.ceil(remaining / (laterStages - i));
      stages.push({ stage: stages.length + 1, onAtC: setpoints.coolingC + pattern.stageStepK * stages.length, fans });
      remaining -= fans;
    }
  }
  return { deadbandK, requiredDeadbandK: pattern.requiredDeadbandK, ok, warnings, stages };
}

// Quantities in warnings are tokens (see ../prose.ts): the reader's unit system shows them.
function degC(celsius: number): string {
  return quantityToken('temperature', celsius);
}

function kelvin(differenceK: number): string {
  return quantityToken('temperatureDifference', differenceK);
}

import type { Setpoints } from '../house.types';

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
      `The cooling setpoint (${setpoints.coolingC} °C) is not above the heating setpoint (${highestHeatingC} °C): heaters and fans would run at the same time. Raise the cooling setpoint to at least ${highestHeatingC + pattern.requiredDeadbandK} °C.`,
    );
  } else if (!ok) {
    warnings.push(
      `The cooling setpoint is only ${round1(deadbandK)} K above the heating setpoint; keep at least ${pattern.requiredDeadbandK} K so heaters and fans do not run together (cooling setpoint ${highestHeatingC + pattern.requiredDeadbandK} °C or more).`,
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

function round1(value: number): number {
  return Math.round(value * 10) / 10;
}

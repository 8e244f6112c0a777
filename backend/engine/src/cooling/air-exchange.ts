import type { ExhaustFans } from '../house.types';

export interface AirExchange {
  installedFlowM3PerS: number;
  airChangesPerHour: number;
  airChangesPerMinute: number;
  /** m³/s per m² of floor (the UI shows cfm/ft²) */
  flowPerFloorAreaM3PerSM2: number;
}

/** What the installed exhaust fans move, against the house's volume and floor. */
export function airExchange(fans: ExhaustFans, geometry: { floorAreaM2: number; volumeM3: number }): AirExchange {
  const installedFlowM3PerS = fans.count * fans.capacityEachM3PerS;
  const airChangesPerMinute = (installedFlowM3PerS * 60) / geometry.volumeM3;
  return {
    installedFlowM3PerS,
    airChangesPerHour: airChangesPerMinute * 60,
    airChangesPerMinute,
    flowPerFloorAreaM3PerSM2: installedFlowM3PerS / geometry.floorAreaM2,
  };
}

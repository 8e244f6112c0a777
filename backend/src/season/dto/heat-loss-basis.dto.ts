import { ApiProperty } from '@nestjs/swagger';

export const HEAT_LOSS_BASES = ['handbook', 'calibrated'] as const;
export type HeatLossBasis = (typeof HEAT_LOSS_BASES)[number];

/** Which heat-loss basis a run used. */
export class HeatLossBasisUsedDto {
  @ApiProperty({ enum: HEAT_LOSS_BASES, description: 'the basis asked for' }) heatLossBasisRequested: HeatLossBasis;
  @ApiProperty({ enum: HEAT_LOSS_BASES, description: 'the basis used (handbook when the house has no calibration)' })
  heatLossBasis: HeatLossBasis;
  @ApiProperty({ description: 'multiplier applied to the heat-loss coefficient (1 on the handbook basis)' })
  heatLossFactor: number;
  @ApiProperty({ type: Number, nullable: true }) calibrationId: number | null;
  @ApiProperty({ type: String, nullable: true, description: 'when the calibration used was run, ISO 8601' })
  calibratedAt: string | null;
  @ApiProperty({
    type: String,
    nullable: true,
    description:
      'why the handbook was used although calibrated was asked for, or that the house changed after its calibration',
  })
  heatLossBasisNote: string | null;
}

/** Which heat-loss basis the farm budget used, stated in words. */
export class BudgetHeatLossBasisDto {
  @ApiProperty({ enum: HEAT_LOSS_BASES }) heatLossBasisRequested: HeatLossBasis;
  @ApiProperty({
    enum: ['handbook', 'calibrated', 'mixed'],
    description: 'mixed: some houses calibrated, the others on the handbook values',
  })
  heatLossBasis: HeatLossBasis | 'mixed';
  @ApiProperty({ type: Number, nullable: true }) calibrationId: number | null;
  @ApiProperty({ type: String, nullable: true }) calibratedAt: string | null;
  @ApiProperty({ description: 'the basis in words, for the page and the report' }) heatLossBasisStatement: string;
}

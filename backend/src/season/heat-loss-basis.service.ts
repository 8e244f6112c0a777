import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { SavedCalibration } from '../calibration/models/saved-calibration.model';
import type { BudgetHeatLossBasisDto, HeatLossBasis, HeatLossBasisUsedDto } from './dto/heat-loss-basis.dto';

/** The newest calibration of a farm, read once per request, and what it gives each house. */
export class FarmHeatLossBasis {
  constructor(
    readonly requested: HeatLossBasis,
    private readonly calibration: SavedCalibration | null,
  ) {}

  /**
   * The basis and factor for one house; falls back to the handbook, saying why. With the house's
   * current version, a house changed since the calibration keeps its factor with a note.
   */
  forHouse(houseId: number, houseName: string, houseVersion?: number): HeatLossBasisUsedDto {
    const handbook = (note: string | null): HeatLossBasisUsedDto => ({
      heatLossBasisRequested: this.requested,
      heatLossBasis: 'handbook',
      heatLossFactor: 1,
      calibrationId: this.calibration?.id ?? null,
      calibratedAt: this.calibration?.createdAt.toISOString() ?? null,
      heatLossBasisNote: note,
    });
    if (this.requested === 'handbook') return handbook(null);
    if (!this.calibration) {
      return handbook(
        'This farm has no calibration against fuel bills yet, so the figures use the handbook values. Enter the fuel bills and run the calibration on the fuel records page.',
      );
    }
    const house = this.calibration.result.houses.find((entry) => entry.houseId === houseId);
    if (!house || house.factor === null) {
      return handbook(
        `${houseName} has no calibrated factor (no fitted bills name it), so its figures use the handbook values.`,
      );
    }
    const calibratedAt = this.calibration.createdAt.toISOString();
    const snapshot = this.calibration.inputs.houses.find((entry) => entry.id === houseId);
    const changed = houseVersion !== undefined && snapshot !== undefined && snapshot.version !== houseVersion;
    return {
      heatLossBasisRequested: this.requested,
      heatLossBasis: 'calibrated',
      heatLossFactor: house.factor,
      calibrationId: this.calibration.id,
      calibratedAt,
      heatLossBasisNote: changed
        ? `${houseName} was changed after the calibration of ${calibratedAt.slice(0, 10)}; its factor was fitted to the house as it was. Run the calibration again if the change affects its heat loss.`
        : null,
    };
  }
}

@Injectable()
export class HeatLossBasisService {
  constructor(@InjectModel(SavedCalibration) private readonly calibrations: typeof SavedCalibration) {}

  async forFarm(farmId: number, requested: HeatLossBasis | undefined): Promise<FarmHeatLossBasis> {
    const basis = requested ?? 'handbook';
    if (basis === 'handbook') return new FarmHeatLossBasis(basis, null);
    const newest = await this.calibrations.findOne({
      where: { farmId },
      order: [
        ['createdAt', 'DESC'],
        ['id', 'DESC'],
      ],
    });
    return new FarmHeatLossBasis(basis, newest);
  }
}

/** The budget's statement of its basis: which was used, and a note when houses fell back. */
export function budgetBasis(
  basis: FarmHeatLossBasis,
  used: Array<{ name: string; basis: HeatLossBasisUsedDto }>,
): BudgetHeatLossBasisDto {
  const calibrated = used.filter((house) => house.basis.heatLossBasis === 'calibrated');
  const fellBack = used.filter((house) => house.basis.heatLossBasis === 'handbook' && house.basis.heatLossBasisNote);
  const changed = calibrated.filter((house) => house.basis.heatLossBasisNote);
  const first = used[0]?.basis;
  let statement: string;
  if (basis.requested === 'handbook') {
    statement = 'Heat loss from the handbook values (coverings, perimeter and air-leakage class).';
  } else if (calibrated.length === 0) {
    statement = `Heat loss from the handbook values: ${fellBack[0]?.basis.heatLossBasisNote ?? 'no house has a calibrated factor.'}`;
  } else {
    const when = first?.calibratedAt ? ` run on ${first.calibratedAt.slice(0, 10)}` : '';
    statement =
      `As calibrated against the farm's fuel bills (calibration${when}): ` +
      calibrated.map((house) => `${house.name} × ${house.basis.heatLossFactor.toFixed(2)}`).join(', ') +
      '.' +
      (fellBack.length > 0
        ? ` ${fellBack.map((house) => house.name).join(', ')} ${fellBack.length === 1 ? 'has' : 'have'} no calibrated factor and stay${fellBack.length === 1 ? 's' : ''} on the handbook values.`
        : '') +
      (changed.length > 0
        ? ` ${changed.map((house) => house.name).join(', ')} changed after the calibration: run it again if the change affects heat loss.`
        : '');
  }
  return {
    heatLossBasisRequested: basis.requested,
    heatLossBasis: calibrated.length === 0 ? 'handbook' : calibrated.length === used.length ? 'calibrated' : 'mixed',
    calibrationId: first?.calibrationId ?? null,
    calibratedAt: first?.calibratedAt ?? null,
    heatLossBasisStatement: statement,
  };
}

import { Injectable } from '@nestjs/common';
import { EngineInputError } from '@thermbay/engine/errors';
import type { HouseSpec } from '@thermbay/engine/house.types';
import { referenceRow, type ReferenceData } from '@thermbay/engine/reference-data.types';
import { lampTypeRows } from '@thermbay/engine/lamps/lamps';
import { loadReferenceData } from './load-reference-data';

/** The handbook tables, read once at boot (a table without provenance stops the app). */
@Injectable()
export class ReferenceDataService {
  readonly data: ReferenceData = loadReferenceData();

  /** Unknown reference ids are refused at the edge, naming the field. */
  assertHouseReferences(house: Partial<HouseSpec>, prefix = ''): void {
    const check = (table: string, field: string, id: string | null | undefined) => {
      if (id === undefined || id === null) return;
      if (!referenceRow(this.data, table, id)) {
        throw new EngineInputError(
          `${prefix}${field}`,
          `${prefix}${field}: "${id}" is not in reference-data/${table}.json`,
        );
      }
    };
    if (house.coverings) {
      check('coverings', 'coverings.roof', house.coverings.roof);
      check('coverings', 'coverings.sidewalls', house.coverings.sidewalls);
      check('coverings', 'coverings.endwalls', house.coverings.endwalls);
    }
    check('air-leakage', 'airLeakageClassId', house.airLeakageClassId);
    check('curtains', 'curtainId', house.curtainId);
    check('kneewalls', 'kneewallId', house.kneewallId);
    house.heaters?.forEach((heater, index) => check('fuels', `heaters.${index}.fuelId`, heater.fuelId));
    const lampTypeId = house.lamps?.lampTypeId;
    if (
      lampTypeId !== undefined &&
      lampTypeId !== null &&
      !lampTypeRows(this.data).some((row) => row.id === lampTypeId)
    ) {
      throw new EngineInputError(
        `${prefix}lamps.lampTypeId`,
        `${prefix}lamps.lampTypeId: "${lampTypeId}" is not a lamp type in reference-data/lamps.json`,
      );
    }
  }
}

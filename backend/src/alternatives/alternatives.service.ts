import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { Transaction } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import {
  applyHousePatch,
  assertPatchFields,
  housePatchBetween,
  NOT_PATCHABLE_FIELDS,
  patchedPaths,
  reverseHousePatch,
  type HousePatch,
} from '@thermbay/engine/alternatives/house-patch';
import { EngineInputError } from '@thermbay/engine/errors';
import type { HouseSpec } from '@thermbay/engine/house.types';
import { validateCalendar, type ProductionCalendar } from '@thermbay/engine/season/production-calendar';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import type { FieldProblem } from '../common/filters/all-exceptions.filter';
import type { Permission } from '../common/permissions';
import { FarmAccessService } from '../farms/farm-access.service';
import type { HouseDto } from '../houses/dto/house.dto';
import { houseToDto, houseToSpec } from '../houses/house.mapper';
import { HousesService } from '../houses/houses.service';
import { House } from '../houses/models/house.model';
import { HouseCalendar, type StoredProductionPeriod } from '../season/models/house-calendar.model';
import { User } from '../users/models/user.model';
import type {
  AdoptAlternativeResultDto,
  AlternativeDto,
  CreateAlternativeDto,
  DuplicateHouseDto,
  UpdateAlternativeDto,
} from './dto/alternative.dto';
import { HouseAlternative } from './models/house-alternative.model';

/** Fields a house body carries besides who it is: what a patch may change. */
function patchableFields(dto: HouseDto): Record<string, unknown> {
  const fields: Record<string, unknown> = { ...dto };
  for (const key of NOT_PATCHABLE_FIELDS) delete fields[key];
  return fields;
}

function cleanPeriods(periods: StoredProductionPeriod[]): StoredProductionPeriod[] {
  return periods.map((p) => {
    const clean: StoredProductionPeriod = { startMonthDay: p.startMonthDay, endMonthDay: p.endMonthDay, mode: p.mode };
    if (p.dayHeatingC !== undefined && p.dayHeatingC !== null) clean.dayHeatingC = p.dayHeatingC;
    if (p.nightHeatingC !== undefined && p.nightHeatingC !== null) clean.nightHeatingC = p.nightHeatingC;
    if (p.label) clean.label = p.label;
    return clean;
  });
}

/** The order alternatives are listed in: oldest first (the id breaks ties of one instant). */
const LIST_ORDER: Array<[string, 'ASC']> = [
  ['createdAt', 'ASC'],
  ['id', 'ASC'],
];

/** An alternative resolved against its house as the house is now. */
export interface ResolvedAlternative {
  row: HouseAlternative;
  /** the house with the patch merged on; null when that is not a valid house */
  house: HouseDto | null;
  invalid: FieldProblem | null;
}

/**
 * Alternatives of a house: named patches over its fields, read against the house as it is now, so
 * an edit of the house flows into every alternative that does not change that field.
 */
@Injectable()
export class AlternativesService {
  constructor(
    @InjectModel(HouseAlternative) private readonly alternatives: typeof HouseAlternative,
    @InjectModel(HouseCalendar) private readonly calendars: typeof HouseCalendar,
    @InjectModel(House) private readonly houseRows: typeof House,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly houses: HousesService,
    private readonly access: FarmAccessService,
  ) {}

  async list(user: AuthenticatedUser, houseId: number): Promise<AlternativeDto[]> {
    const house = await this.houses.loadFor(user, houseId, 'house:read');
    const rows = await this.alternatives.findAll({
      where: { houseId },
      include: [{ model: User, attributes: ['id', 'name'] }],
      order: LIST_ORDER,
    });
    return rows.map((row) => this.toDto(this.resolve(house, row)));
  }

  /** The ids of a house's alternatives in the order the list shows them (oldest first). */
  async idsInListOrder(houseId: number): Promise<number[]> {
    const rows = await this.alternatives.findAll({ where: { houseId }, attributes: ['id'], order: LIST_ORDER });
    return rows.map((row) => row.id);
  }

  async get(user: AuthenticatedUser, alternativeId: number): Promise<AlternativeDto> {
    const { house, row } = await this.loadFor(user, alternativeId, 'house:read');
    return this.toDto(this.resolve(house, row));
  }

  async create(user: AuthenticatedUser, houseId: number, body: CreateAlternativeDto): Promise<AlternativeDto> {
    const house = await this.houses.loadFor(user, houseId, 'alternative:write');
    const patch = this.patchOf(house, body) ?? {};
    const calendar = this.calendarOf(body.calendar);
    this.assertValid(house, patch);
    const row = await this.alternatives.create({
      houseId,
      name: body.name,
      notes: body.notes ?? null,
      patch,
      calendar,
      costAmount: body.costAmount ?? null,
      createdById: user.id,
    });
    return this.get(user, row.id);
  }

  async update(user: AuthenticatedUser, alternativeId: number, body: UpdateAlternativeDto): Promise<AlternativeDto> {
    const { house, row } = await this.loadFor(user, alternativeId, 'alternative:write');
    const changes: Partial<HouseAlternative> = {};
    const patch = this.patchOf(house, body);
    if (patch !== undefined) {
      this.assertValid(house, patch);
      changes.patch = patch;
    }
    if (body.calendar !== undefined) changes.calendar = this.calendarOf(body.calendar);
    if (body.name !== undefined) changes.name = body.name;
    if (body.notes !== undefined) changes.notes = body.notes;
    if (body.costAmount !== undefined) changes.costAmount = body.costAmount;
    await row.update(changes);
    return this.get(user, alternativeId);
  }

  async remove(user: AuthenticatedUser, alternativeId: number): Promise<void> {
    const { row } = await this.loadFor(user, alternativeId, 'alternative:write');
    await row.destroy();
  }

  /**
   * "Make this the house": the house takes the alternative's fields (and calendar, if it has its
   * own) in one transaction; the house as it was is kept as an alternative, and the adopted one,
   * now the same as the house, is removed.
   */
  async adopt(user: AuthenticatedUser, alternativeId: number): Promise<AdoptAlternativeResultDto> {
    const { house, row } = await this.loadFor(user, alternativeId, 'house:write');
    const resolved = this.resolve(house, row);
    if (!resolved.house) {
      const problem = resolved.invalid as FieldProblem;
      throw new EngineInputError(`patch.${problem.field}`, `this alternative is not a valid house: ${problem.message}`);
    }
    const before = houseToDto(house);
    const previousId = await this.sequelize.transaction(async (transaction) => {
      const calendarRow = await this.calendars.findOne({ where: { houseId: house.id }, transaction });
      const previousCalendar = row.calendar === null ? null : cleanPeriods(calendarRow?.periods ?? []);
      await house.update(patchableFields(resolved.house as HouseDto), { transaction });
      if (row.calendar !== null) await this.putCalendar(house.id, row.calendar, transaction, calendarRow);
      const previous = await this.alternatives.create(
        {
          houseId: house.id,
          name: `Before “${row.name}”`.slice(0, 120),
          notes: `The house as it was before “${row.name}” was made the house.`,
          patch: reverseHousePatch(patchableFields(before), row.patch),
          calendar: previousCalendar,
          costAmount: null,
          createdById: user.id,
        },
        { transaction },
      );
      await row.destroy({ transaction });
      return previous.id;
    });
    await house.reload();
    return { house: houseToDto(house), previous: await this.get(user, previousId) };
  }

  /** A copy of the house with everything it has: fields, production calendar and alternatives. */
  async duplicate(user: AuthenticatedUser, houseId: number, body: DuplicateHouseDto): Promise<HouseDto> {
    const house = await this.houses.loadFor(user, houseId, 'house:read');
    await this.access.require(user, house.farmId, 'house:write');
    const copyId = await this.sequelize.transaction(async (transaction) => {
      const fields = patchableFields(houseToDto(house));
      const copy = await this.houseRows.create(
        {
          ...fields,
          farmId: house.farmId,
          name: body.name ?? `${house.name} (copy)`.slice(0, 120),
          notes: house.notes,
        },
        { transaction },
      );
      const calendarRow = await this.calendars.findOne({ where: { houseId }, transaction });
      if (calendarRow) await this.calendars.create({ houseId: copy.id, periods: calendarRow.periods }, { transaction });
      const alternatives = await this.alternatives.findAll({ where: { houseId }, transaction });
      for (const alt of alternatives) {
        await this.alternatives.create(
          {
            houseId: copy.id,
            name: alt.name,
            notes: alt.notes,
            patch: alt.patch,
            calendar: alt.calendar,
            costAmount: alt.costAmount,
            createdById: alt.createdById,
          },
          { transaction },
        );
      }
      return copy.id;
    });
    return this.houses.get(user, copyId);
  }

  /**
   * The house an estimate runs on: the stored house, or one of its alternatives. Throws 422 naming
   * the field when the alternative is not a valid house now.
   */
  async houseForRun(
    user: AuthenticatedUser,
    houseId: number,
    alternativeId: number | undefined,
    permission: Permission,
  ): Promise<{ stored: House; house: HouseSpec; calendar: ProductionCalendar | null | undefined }> {
    const stored = await this.houses.loadFor(user, houseId, permission);
    if (alternativeId === undefined) return { stored, house: houseToSpec(stored), calendar: undefined };
    const row = await this.alternatives.findOne({ where: { id: alternativeId, houseId } });
    if (!row) throw new EngineInputError('alternativeId', 'this house has no such alternative');
    const resolved = this.resolve(stored, row);
    if (!resolved.house) {
      const problem = resolved.invalid as FieldProblem;
      throw new EngineInputError(
        `alternative.${problem.field}`,
        `this alternative is not a valid house: ${problem.message}`,
      );
    }
    return { stored, house: houseToSpec(resolved.house), calendar: this.engineCalendar(row.calendar) };
  }

  /** Alternatives of a house, resolved; the ids must belong to the house. */
  async resolveMany(house: House, ids: number[]): Promise<ResolvedAlternative[]> {
    const rows = await this.alternatives.findAll({ where: { houseId: house.id } });
    return ids.map((id) => {
      const row = rows.find((r) => r.id === id);
      if (!row) throw new EngineInputError('alternativeIds', `alternative ${id} is not one of this house's`);
      return this.resolve(house, row);
    });
  }

  /** null = the house's own calendar; [] = heated all season; else the periods without their labels. */
  engineCalendar(calendar: StoredProductionPeriod[] | null): ProductionCalendar | null | undefined {
    if (calendar === null) return undefined;
    if (calendar.length === 0) return null;
    return calendar.map(({ label: _label, ...period }) => period);
  }

  resolve(house: House, row: HouseAlternative): ResolvedAlternative {
    const base = houseToDto(house);
    try {
      assertPatchFields(base, row.patch);
    } catch (error) {
      if (error instanceof EngineInputError) return { row, house: null, invalid: this.problem(error) };
      throw error;
    }
    const merged = applyHousePatch(base, row.patch);
    const invalid = this.houses.checkHouse(merged);
    return { row, house: invalid ? null : merged, invalid };
  }

  private problem(error: EngineInputError): FieldProblem {
    return { field: error.field.replace(/^patch\./, ''), message: error.message };
  }

  private patchOf(house: House, body: UpdateAlternativeDto): HousePatch | undefined {
    if (body.patch !== undefined && body.house !== undefined) {
      throw new EngineInputError('house', 'give either patch or house, not both');
    }
    const base = houseToDto(house);
    if (body.house !== undefined) return housePatchBetween(base, body.house);
    if (body.patch !== undefined) {
      assertPatchFields(base, body.patch);
      return body.patch;
    }
    return undefined;
  }

  private assertValid(house: House, patch: HousePatch): void {
    const invalid = this.houses.checkHouse(applyHousePatch(houseToDto(house), patch));
    if (invalid) throw new EngineInputError(`patch.${invalid.field}`, invalid.message);
  }

  private calendarOf(calendar: StoredProductionPeriod[] | null | undefined): StoredProductionPeriod[] | null {
    if (calendar === undefined || calendar === null) return null;
    const periods = cleanPeriods(calendar);
    validateCalendar(periods, 'calendar');
    return periods;
  }

  private async putCalendar(
    houseId: number,
    periods: StoredProductionPeriod[],
    transaction: Transaction,
    existing: HouseCalendar | null,
  ): Promise<void> {
    if (existing) await existing.update({ periods }, { transaction });
    else await this.calendars.create({ houseId, periods }, { transaction });
  }

  private async loadFor(
    user: AuthenticatedUser,
    alternativeId: number,
    permission: Permission,
  ): Promise<{ house: House; row: HouseAlternative }> {
    const row = await this.alternatives.findByPk(alternativeId, {
      include: [{ model: User, attributes: ['id', 'name'] }],
    });
    if (!row) throw new NotFoundException('No such alternative');
    try {
      const house = await this.houses.loadFor(user, row.houseId, permission);
      return { house, row };
    } catch (error) {
      if (error instanceof NotFoundException) throw new NotFoundException('No such alternative');
      throw error;
    }
  }

  private toDto(resolved: ResolvedAlternative): AlternativeDto {
    const { row } = resolved;
    return {
      id: row.id,
      houseId: row.houseId,
      name: row.name,
      notes: row.notes ?? null,
      patch: row.patch,
      changedFields: patchedPaths(row.patch),
      calendar: row.calendar,
      costAmount: row.costAmount ?? null,
      createdById: row.createdById ?? null,
      createdByName: row.createdBy?.name ?? null,
      invalid: resolved.invalid,
      house: resolved.house,
      createdAt: row.createdAt.toISOString(),
      updatedAt: row.updatedAt.toISOString(),
    };
  }
}

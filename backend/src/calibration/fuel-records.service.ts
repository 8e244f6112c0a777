import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { plainToInstance } from 'class-transformer';
import { validateSync } from 'class-validator';
import type { Transaction } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { fuelQuantityToKWh } from '@thermbay/engine/calibration/fuel-units';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { RequestValidationException, type FieldProblem } from '../common/filters/all-exceptions.filter';
import type { Permission } from '../common/permissions';
import { flatten } from '../common/validation';
import { assertVersion, changesNothing, expectedVersion } from '../common/versioning';
import { FarmAccessService } from '../farms/farm-access.service';
import { House } from '../houses/models/house.model';
import { ReferenceDataService } from '../reference-data/reference-data.service';
import type { UploadedCsvFile } from '../temperature-logs/uploaded-file';
import {
  FuelRecordColumnMappingDto,
  type CreateFuelRecordDto,
  type FuelRecordCsvInspectionDto,
  type FuelRecordDto,
  type FuelRecordsUploadResultDto,
  type UpdateFuelRecordDto,
} from './dto/fuel-record.dto';
import {
  daysOf,
  FIELD_WORDS,
  fuelById,
  FUEL_RECORD_CSV_MAX_BYTES,
  proposeMapping,
  readFuelCsv,
  recordProblems,
  recordsFromCsv,
  type FuelRecordCandidate,
} from './fuel-record-rules';
import { FuelRecord, FuelRecordHouse } from './models/fuel-record.model';

/**
 * A farm's fuel bills and tank deliveries: entered one by one or uploaded as a CSV file with
 * confirmed columns. Anyone who edits houses writes them; everyone on the farm reads them. A bad
 * record or file answers 400 naming the row and field, and stores nothing.
 */
@Injectable()
export class FuelRecordsService {
  constructor(
    @InjectModel(FuelRecord) private readonly records: typeof FuelRecord,
    @InjectModel(FuelRecordHouse) private readonly links: typeof FuelRecordHouse,
    @InjectModel(House) private readonly houses: typeof House,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly access: FarmAccessService,
    private readonly reference: ReferenceDataService,
  ) {}

  async list(user: AuthenticatedUser, farmId: number): Promise<FuelRecordDto[]> {
    await this.access.require(user, farmId, 'farm:read');
    return this.listOf(farmId);
  }

  /** The farm's records in date order (access already checked). */
  async listOf(farmId: number, transaction?: Transaction): Promise<FuelRecordDto[]> {
    const rows = await this.records.findAll({
      where: { farmId },
      order: [
        ['startDate', 'ASC'],
        ['id', 'ASC'],
      ],
      transaction,
    });
    const links = await this.links.findAll({ where: { fuelRecordId: rows.map((row) => row.id) }, transaction });
    return rows.map((row) =>
      this.toDto(
        row,
        links.filter((link) => link.fuelRecordId === row.id).map((link) => link.houseId),
      ),
    );
  }

  async create(user: AuthenticatedUser, farmId: number, body: CreateFuelRecordDto): Promise<FuelRecordDto> {
    await this.access.require(user, farmId, 'house:write');
    const candidate = normalise(body);
    await this.assertValid(farmId, candidate);
    return this.sequelize.transaction(async (transaction) => {
      const row = await this.records.create({ ...recordColumns(candidate), farmId }, { transaction });
      await this.link(row.id, candidate.houseIds, transaction);
      return this.toDto(row, candidate.houseIds);
    });
  }

  async update(
    user: AuthenticatedUser,
    recordId: number,
    body: UpdateFuelRecordDto,
    ifMatch?: string,
  ): Promise<FuelRecordDto> {
    const loaded = await this.loadFor(user, recordId, 'house:write');
    const expected = expectedVersion(ifMatch);
    return this.sequelize.transaction(async (transaction) => {
      const row = await this.records.findByPk(recordId, { transaction, lock: transaction.LOCK.UPDATE });
      if (!row) throw new NotFoundException('No such fuel record');
      const current = this.toDto(row, await this.houseIdsOf(row.id, transaction));
      const changes = {
        ...body,
        houseIds: body.houseIds ? [...new Set(body.houseIds)].sort((a, b) => a - b) : undefined,
      };
      if (changesNothing(current as unknown as Record<string, unknown>, changes)) return current;
      assertVersion(row.version, expected, () => current);
      const merged = normalise({ ...current, ...stripUndefined(changes) } as CreateFuelRecordDto);
      await this.assertValid(loaded.farmId, merged, transaction);
      await row.update({ ...recordColumns(merged), version: row.version + 1 }, { transaction });
      await this.links.destroy({ where: { fuelRecordId: row.id }, transaction });
      await this.link(row.id, merged.houseIds, transaction);
      return this.toDto(row, merged.houseIds);
    });
  }

  async remove(user: AuthenticatedUser, recordId: number): Promise<void> {
    const row = await this.loadFor(user, recordId, 'house:write');
    await row.destroy();
  }

  async inspect(
    user: AuthenticatedUser,
    farmId: number,
    file: UploadedCsvFile | undefined,
  ): Promise<FuelRecordCsvInspectionDto> {
    await this.access.require(user, farmId, 'house:write');
    const csv = readOrThrow(requireFile(file));
    return {
      columns: csv.columns,
      preview: csv.rows.slice(0, 5),
      rowCount: csv.rows.length,
      proposed: proposeMapping(csv.columns),
    };
  }

  /** Stores every row of the file, or none: any bad row answers 400 listing each row and field. */
  async upload(
    user: AuthenticatedUser,
    farmId: number,
    file: UploadedCsvFile | undefined,
    mappingText: string,
  ): Promise<FuelRecordsUploadResultDto> {
    await this.access.require(user, farmId, 'house:write');
    const csv = readOrThrow(requireFile(file));
    const mapping = parseMapping(mappingText);
    const houses = await this.houses.findAll({ where: { farmId }, attributes: ['id', 'name'] });
    const { records, problems } = recordsFromCsv(csv, mapping, {
      ref: this.reference.data,
      farmHouseIds: new Set(houses.map((house) => house.id)),
      houseByName: new Map(houses.map((house) => [house.name.trim().toLowerCase(), house.id])),
    });
    if (problems.length > 0) throw new RequestValidationException(problems);
    const created = await this.sequelize.transaction(async (transaction) => {
      const dtos: FuelRecordDto[] = [];
      for (const candidate of records) {
        const row = await this.records.create({ ...recordColumns(candidate), farmId }, { transaction });
        await this.link(row.id, candidate.houseIds, transaction);
        dtos.push(this.toDto(row, candidate.houseIds));
      }
      return dtos;
    });
    return { created: created.length, records: created };
  }

  private async assertValid(farmId: number, candidate: FuelRecordCandidate, transaction?: Transaction): Promise<void> {
    const houses = await this.houses.findAll({ where: { farmId }, attributes: ['id'], transaction });
    const problems = recordProblems(candidate, this.reference.data, new Set(houses.map((house) => house.id)));
    if (problems.length > 0) {
      throw new RequestValidationException(
        problems.map((problem) => ({
          field: problem.field,
          message: `${capitalise(FIELD_WORDS[problem.field] ?? problem.field)}: ${problem.message}`,
        })),
      );
    }
  }

  private async link(fuelRecordId: number, houseIds: number[], transaction: Transaction): Promise<void> {
    for (const houseId of houseIds) await this.links.create({ fuelRecordId, houseId }, { transaction });
  }

  private async houseIdsOf(recordId: number, transaction?: Transaction): Promise<number[]> {
    const links = await this.links.findAll({ where: { fuelRecordId: recordId }, transaction });
    return links.map((link) => link.houseId).sort((a, b) => a - b);
  }

  private toDto(row: FuelRecord, houseIds: number[]): FuelRecordDto {
    const fuel = fuelById(this.reference.data, row.fuelId);
    let fuelEnergyKWh = 0;
    try {
      if (fuel) fuelEnergyKWh = fuelQuantityToKWh(row.quantity, row.quantityUnit, fuel);
    } catch {
      fuelEnergyKWh = 0;
    }
    return {
      id: row.id,
      farmId: row.farmId,
      fuelId: row.fuelId,
      fuelLabel: fuel?.label ?? row.fuelId,
      quantity: row.quantity,
      quantityUnit: row.quantityUnit,
      fuelEnergyKWh,
      cost: row.cost ?? null,
      startDate: row.startDate,
      endDate: row.endDate,
      days: daysOf(row.startDate, row.endDate),
      houseIds: [...houseIds].sort((a, b) => a - b),
      nonHeatingPerDay: row.nonHeatingPerDay ?? null,
      note: row.note ?? null,
      version: row.version,
    };
  }

  private async loadFor(user: AuthenticatedUser, recordId: number, permission: Permission): Promise<FuelRecord> {
    const row = await this.records.findByPk(recordId);
    if (!row) throw new NotFoundException('No such fuel record');
    try {
      await this.access.require(user, row.farmId, permission);
    } catch (error) {
      if (error instanceof NotFoundException) throw new NotFoundException('No such fuel record');
      throw error;
    }
    return row;
  }
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

function stripUndefined<T extends object>(value: T): Partial<T> {
  return Object.fromEntries(Object.entries(value).filter(([, v]) => v !== undefined)) as Partial<T>;
}

function normalise(body: CreateFuelRecordDto): FuelRecordCandidate {
  return {
    fuelId: body.fuelId,
    quantity: body.quantity,
    quantityUnit: body.quantityUnit.trim(),
    cost: body.cost ?? null,
    startDate: body.startDate,
    endDate: body.endDate,
    houseIds: [...new Set(body.houseIds)].sort((a, b) => a - b),
    nonHeatingPerDay: body.nonHeatingPerDay ?? null,
    note: body.note?.trim() || null,
  };
}

function recordColumns(candidate: FuelRecordCandidate) {
  const { houseIds: _houseIds, ...columns } = candidate;
  return columns;
}

function requireFile(file: UploadedCsvFile | undefined): UploadedCsvFile {
  if (!file || !file.buffer) {
    throw new RequestValidationException([
      { field: 'file', message: 'choose a CSV file to upload (multipart field "file")' },
    ]);
  }
  if (file.size > FUEL_RECORD_CSV_MAX_BYTES) {
    throw new RequestValidationException([
      {
        field: 'file',
        message: `the file is larger than ${FUEL_RECORD_CSV_MAX_BYTES / 1024} kB; a list of bills is far smaller`,
      },
    ]);
  }
  return file;
}

function readOrThrow(file: UploadedCsvFile) {
  try {
    return readFuelCsv(new Uint8Array(file.buffer));
  } catch (problems) {
    if (Array.isArray(problems)) throw new RequestValidationException(problems as FieldProblem[]);
    throw problems;
  }
}

function parseMapping(text: string): FuelRecordColumnMappingDto {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    value = null;
  }
  if (!value || typeof value !== 'object' || Array.isArray(value)) {
    throw new RequestValidationException([
      { field: 'mapping', message: 'mapping must be a JSON object (the columns you confirmed)' },
    ]);
  }
  const instance = plainToInstance(FuelRecordColumnMappingDto, value);
  const errors = validateSync(instance, { whitelist: true, forbidNonWhitelisted: true });
  if (errors.length > 0) throw new RequestValidationException(flatten(errors, 'mapping'));
  return instance;
}

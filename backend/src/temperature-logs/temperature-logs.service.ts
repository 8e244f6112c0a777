import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { plainToInstance } from 'class-transformer';
import { validateSync, type ValidationError } from 'class-validator';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { RequestValidationException, type FieldProblem } from '../common/filters/all-exceptions.filter';
import type { Permission } from '../common/permissions';
import { type TemperatureColumnMapping, type TemperatureLogReading } from './csv/temperature-log-csv';
import { TemperatureCsvWorkers } from './csv/temperature-csv-workers';
import { EngineInputError } from '@thermbay/engine/errors';
import { FarmAccessService } from '../farms/farm-access.service';
import {
  TemperatureColumnMappingDto,
  type TemperatureCsvInspectionDto,
  type TemperatureLogDayDto,
  type TemperatureLogDetailDto,
  type TemperatureLogDto,
  type UploadTemperatureLogDto,
} from './dto/temperature-log.dto';
import { TemperatureLog } from './models/temperature-log.model';
import type { UploadedCsvFile } from './uploaded-file';

/** Columns listed without the readings (which can run to a year of hours). */
const SUMMARY_ATTRIBUTES = [
  'id',
  'farmId',
  'name',
  'resolution',
  'startDate',
  'endDate',
  'rowCount',
  'readingCount',
  'createdAt',
];

export function temperatureLogToDto(row: TemperatureLog): TemperatureLogDto {
  return {
    id: row.id,
    farmId: row.farmId,
    name: row.name,
    resolution: row.resolution,
    startDate: row.startDate,
    endDate: row.endDate,
    rowCount: row.rowCount,
    readingCount: row.readingCount,
    createdAt: row.createdAt.toISOString(),
  };
}

/** One row per day: hourly readings reduced to min/mean/max; daily readings as logged. */
export function dailySummary(readings: TemperatureLogReading[]): TemperatureLogDayDto[] {
  const days: TemperatureLogDayDto[] = [];
  let current: { date: string; sum: number; count: number; min: number | null; max: number | null } | null = null;
  const flush = () => {
    if (current)
      days.push({
        date: current.date,
        minC: current.min,
        meanC: current.sum / current.count,
        maxC: current.max,
        readingCount: current.count,
      });
  };
  for (const reading of readings) {
    const date = reading.at.slice(0, 10);
    if (!current || current.date !== date) {
      flush();
      current = { date, sum: 0, count: 0, min: null, max: null };
    }
    current.sum += reading.temperatureC;
    current.count++;
    const low = reading.minC ?? reading.temperatureC;
    const high = reading.maxC ?? reading.temperatureC;
    // A daily log with means only has no minimum or maximum to show.
    const hasExtremes = reading.at.length > 10 || (reading.minC !== undefined && reading.maxC !== undefined);
    if (hasExtremes) {
      current.min = current.min === null ? low : Math.min(current.min, low);
      current.max = current.max === null ? high : Math.max(current.max, high);
    }
  }
  flush();
  return days;
}

function flattenErrors(errors: ValidationError[], parent: string): FieldProblem[] {
  return errors.flatMap((error) => {
    const field = `${parent}.${error.property}`;
    return [
      ...Object.values(error.constraints ?? {}).map((message) => ({
        field,
        message: message.replace(error.property, field),
      })),
      ...flattenErrors(error.children ?? [], field),
    ];
  });
}

/**
 * Logged outdoor temperatures: inspect a CSV file (nothing stored), upload it with the columns
 * the user confirmed, list, read and delete. A bad file stores nothing and answers 422 with
 * one entry per offending line.
 */
@Injectable()
export class TemperatureLogsService {
  constructor(
    @InjectModel(TemperatureLog) private readonly logs: typeof TemperatureLog,
    private readonly access: FarmAccessService,
    private readonly workers: TemperatureCsvWorkers,
  ) {}

  async inspect(
    user: AuthenticatedUser,
    farmId: number,
    file: UploadedCsvFile | undefined,
  ): Promise<TemperatureCsvInspectionDto> {
    // Inspecting is the first step of an upload, so it needs the upload's permission.
    await this.access.require(user, farmId, 'house:write');
    return this.workers.inspect(new Uint8Array(requireFile(file).buffer));
  }

  async upload(
    user: AuthenticatedUser,
    farmId: number,
    file: UploadedCsvFile | undefined,
    body: UploadTemperatureLogDto,
  ): Promise<TemperatureLogDto> {
    await this.access.require(user, farmId, 'house:write');
    const bytes = new Uint8Array(requireFile(file).buffer);
    const mapping = parseMapping(body.mapping);
    const parsed = await this.workers.parse(bytes, mapping);
    const sequelize = this.logs.sequelize!;
    const row = await sequelize.transaction(async (transaction) => {
      const created = await this.logs.create(
        {
          farmId,
          name: body.name.trim(),
          resolution: parsed.resolution,
          startDate: parsed.startDate,
          endDate: parsed.endDate,
          rowCount: parsed.rowCount,
          readingCount: parsed.readingCount,
          mapping,
          readings: [],
        },
        { transaction },
      );
      // The worker wrote the readings as JSON text: store that text as it is rather than have
      // the ORM rebuild and re-serialise a year of readings on the main thread.
      await sequelize.query('UPDATE temperature_logs SET readings = $readings WHERE id = $id', {
        bind: { readings: parsed.readingsJson, id: created.id },
        transaction,
      });
      return created;
    });
    return temperatureLogToDto(row);
  }

  /**
   * Stores readings that did not come from an uploaded file (a year of weather history). The
   * caller has checked the farm permission; the mapping says which columns of the source they are.
   */
  async storeReadings(
    farmId: number,
    name: string,
    readings: TemperatureLogReading[],
    mapping: TemperatureColumnMapping,
  ): Promise<TemperatureLogDto> {
    if (readings.length === 0) throw new EngineInputError('readings', 'there are no readings to store');
    const row = await this.logs.create({
      farmId,
      name,
      resolution: 'hourly',
      startDate: readings[0]!.at.slice(0, 10),
      endDate: readings[readings.length - 1]!.at.slice(0, 10),
      rowCount: readings.length,
      readingCount: readings.length,
      mapping,
      readings,
    });
    return temperatureLogToDto(row);
  }

  async list(user: AuthenticatedUser, farmId: number): Promise<TemperatureLogDto[]> {
    await this.access.require(user, farmId, 'farm:read');
    const rows = await this.logs.findAll({
      where: { farmId },
      attributes: SUMMARY_ATTRIBUTES,
      order: [
        ['createdAt', 'DESC'],
        ['id', 'DESC'],
      ],
    });
    return rows.map(temperatureLogToDto);
  }

  async get(user: AuthenticatedUser, logId: number): Promise<TemperatureLogDetailDto> {
    const row = await this.loadFor(user, logId, 'farm:read');
    return { ...temperatureLogToDto(row), mapping: row.mapping, days: dailySummary(row.readings) };
  }

  async remove(user: AuthenticatedUser, logId: number): Promise<void> {
    const row = await this.loadFor(user, logId, 'house:write');
    await row.destroy();
  }

  /**
   * A farm's log for a season run (access to the farm already checked). A log of another farm
   * is reported as missing, naming the request field.
   */
  async findForFarm(farmId: number, logId: number, field: string): Promise<TemperatureLog> {
    const row = await this.logs.findOne({ where: { id: logId, farmId } });
    if (!row) throw new EngineInputError(field, `this farm has no temperature log ${logId}`);
    return row;
  }

  private async loadFor(user: AuthenticatedUser, logId: number, permission: Permission): Promise<TemperatureLog> {
    const row = await this.logs.findByPk(logId);
    if (!row) throw new NotFoundException('No such temperature log');
    try {
      await this.access.require(user, row.farmId, permission);
    } catch (error) {
      if (error instanceof NotFoundException) throw new NotFoundException('No such temperature log');
      throw error;
    }
    return row;
  }
}

function requireFile(file: UploadedCsvFile | undefined): UploadedCsvFile {
  if (!file || !file.buffer) {
    throw new RequestValidationException([
      { field: 'file', message: 'choose a CSV file to upload (multipart field "file")' },
    ]);
  }
  return file;
}

/** The confirmed mapping arrives as a JSON string inside the multipart form. */
function parseMapping(text: string): TemperatureColumnMapping {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw new RequestValidationException([
      { field: 'mapping', message: 'mapping must be a JSON object (the columns you confirmed)' },
    ]);
  }
  if (!value || typeof value !== 'object' || Array.isArray(value)) {
    throw new RequestValidationException([
      { field: 'mapping', message: 'mapping must be a JSON object (the columns you confirmed)' },
    ]);
  }
  const instance = plainToInstance(TemperatureColumnMappingDto, value);
  const errors = validateSync(instance, { whitelist: true, forbidNonWhitelisted: true });
  if (errors.length > 0) throw new RequestValidationException(flattenErrors(errors, 'mapping'));
  return { ...instance } as TemperatureColumnMapping;
}

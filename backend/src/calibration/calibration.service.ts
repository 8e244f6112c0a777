import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import {
  calibrateHeatLoss,
  type CalibrationHouseInput,
  type CalibrationPeriodInput,
  type CalibrationResult,
} from '@thermbay/engine/calibration/calibrate';
import { kWhPerFuelUnit } from '@thermbay/engine/calibration/fuel-units';
import { EngineInputError } from '@thermbay/engine/errors';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { FarmAccessService } from '../farms/farm-access.service';
import type { Farm } from '../farms/models/farm.model';
import { houseToSpec } from '../houses/house.mapper';
import { House } from '../houses/models/house.model';
import { ReferenceDataService } from '../reference-data/reference-data.service';
import { SeasonInputsService, type FarmSeasonContext } from '../season/season-inputs.service';
import { SunCacheService } from '../season/sun-cache.service';
import { TemperatureLog } from '../temperature-logs/models/temperature-log.model';
import type { CalibrationInputsSnapshot, StoredCalibrationResult, StoredMeter } from './calibration-types';
import type { CalibrationDto } from './dto/calibration.dto';
import type { FuelRecordDto } from './dto/fuel-record.dto';
import { fuelById } from './fuel-record-rules';
import { FuelRecordsService } from './fuel-records.service';
import { SavedCalibration } from './models/saved-calibration.model';

function calibrationToDto(row: SavedCalibration): CalibrationDto {
  return {
    id: row.id,
    farmId: row.farmId,
    createdAt: row.createdAt.toISOString(),
    recordCount: row.inputs.records.length,
    ...row.result,
  };
}

/**
 * Fits each meter's heat-loss factor to the farm's fuel records (the engine's calibrateHeatLoss)
 * on the farm's logged temperatures where a log covers a bill's days, its normals otherwise;
 * each house with its own production calendar, setpoints and heater efficiency. Every run is
 * saved with its inputs; the newest one is what "as calibrated" estimates use.
 */
@Injectable()
export class CalibrationService {
  constructor(
    @InjectModel(SavedCalibration) private readonly calibrations: typeof SavedCalibration,
    @InjectModel(House) private readonly houses: typeof House,
    @InjectModel(TemperatureLog) private readonly logs: typeof TemperatureLog,
    private readonly records: FuelRecordsService,
    private readonly access: FarmAccessService,
    private readonly inputs: SeasonInputsService,
    private readonly reference: ReferenceDataService,
    private readonly sun: SunCacheService,
  ) {}

  async list(user: AuthenticatedUser, farmId: number): Promise<CalibrationDto[]> {
    await this.access.require(user, farmId, 'farm:read');
    const rows = await this.calibrations.findAll({
      where: { farmId },
      order: [
        ['createdAt', 'DESC'],
        ['id', 'DESC'],
      ],
      limit: 20,
    });
    return rows.map(calibrationToDto);
  }

  async get(user: AuthenticatedUser, calibrationId: number): Promise<CalibrationDto> {
    const row = await this.calibrations.findByPk(calibrationId);
    if (!row) throw new NotFoundException('No such calibration');
    try {
      await this.access.require(user, row.farmId, 'farm:read');
    } catch (error) {
      if (error instanceof NotFoundException) throw new NotFoundException('No such calibration');
      throw error;
    }
    return calibrationToDto(row);
  }

  async run(user: AuthenticatedUser, farmId: number): Promise<CalibrationDto> {
    await this.access.require(user, farmId, 'house:write');
    const farm = await this.inputs.farm(farmId);
    const { inputs, result } = await this.calibrate(farm, await this.records.listOf(farmId));
    if (!result.meters.some((meter) => meter.fitted)) {
      throw new EngineInputError(
        'fuelRecords',
        `No factor could be fitted. ${result.meters.map((meter) => meter.refusal).join(' ')}`,
      );
    }
    const row = await this.calibrations.create({ farmId, inputs, result });
    return calibrationToDto(row);
  }

  /** Runs the fit over the given records of a farm (access checked by the caller). */
  async calibrate(
    farm: Farm,
    records: FuelRecordDto[],
  ): Promise<{ inputs: CalibrationInputsSnapshot; result: StoredCalibrationResult }> {
    const ref = this.reference.data;
    const skipped = records
      .filter((record) => record.houseIds.length === 0)
      .map((record) => ({
        recordId: record.id,
        reason: `The bill from ${record.startDate} to ${record.endDate} serves no house any more (its houses were deleted), so it is left out.`,
      }));
    const usable = records.filter((record) => record.houseIds.length > 0);
    if (usable.length === 0) {
      throw new EngineInputError(
        'fuelRecords',
        'Enter the fuel bills or tank deliveries of at least three heating months, with the houses each one served, then run the calibration.',
      );
    }

    const houseIds = [...new Set(usable.flatMap((record) => record.houseIds))];
    const houseRows = await this.houses.findAll({ where: { farmId: farm.id, id: houseIds } });
    const houses: CalibrationHouseInput[] = [];
    const snapshotHouses: CalibrationInputsSnapshot['houses'] = [];
    for (const row of houseRows) {
      const calendar = await this.inputs.calendarOf(row.id);
      houses.push({ id: String(row.id), name: row.name, house: houseToSpec(row), calendar });
      snapshotHouses.push({
        id: row.id,
        name: row.name,
        version: row.version,
        dayHeatingC: row.setpoints.dayHeatingC,
        nightHeatingC: row.setpoints.nightHeatingC,
        calendarPeriodCount: calendar?.length ?? 0,
      });
    }

    const logs = await this.logs.findAll({
      where: { farmId: farm.id },
      attributes: ['id', 'name', 'startDate', 'endDate', 'resolution', 'createdAt'],
      order: [
        ['createdAt', 'DESC'],
        ['id', 'DESC'],
      ],
    });
    const contexts = new Map<string, FarmSeasonContext>();
    const contextFor = async (record: FuelRecordDto, log: TemperatureLog | undefined) => {
      const key = log ? `log-${log.id}` : 'normals';
      let context = contexts.get(key);
      if (!context) {
        try {
          context = await this.inputs.farmContext(
            farm,
            {
              startDate: record.startDate,
              endDate: record.endDate,
              climateSource: log ? { temperatureLogId: log.id } : 'normals',
            },
            new Date(),
          );
        } catch (error) {
          if (error instanceof EngineInputError && !log) {
            throw new EngineInputError(
              `fuelRecords.${record.id}`,
              `The bill from ${record.startDate} to ${record.endDate}: no temperature log covers its days and the farm has no climate normals. Upload a temperature log for that period or enter the farm's climate.`,
            );
          }
          throw error;
        }
        contexts.set(key, context);
      }
      return context;
    };

    const periods: CalibrationPeriodInput[] = [];
    const snapshotRecords: CalibrationInputsSnapshot['records'] = [];
    let site: FarmSeasonContext['site'] | null = null;
    for (const record of usable) {
      const fuel = fuelById(ref, record.fuelId);
      if (!fuel) throw new EngineInputError(`fuelRecords.${record.id}.fuelId`, `unknown fuel ${record.fuelId}`);
      const perUnitKWh = kWhPerFuelUnit(fuel, record.quantityUnit, `fuelRecords.${record.id}.quantityUnit`);
      const log = logs.find(
        (candidate) => candidate.startDate <= record.startDate && candidate.endDate >= record.endDate,
      );
      const context = await contextFor(record, log);
      site ??= context.site;
      periods.push({
        id: String(record.id),
        startDate: record.startDate,
        endDate: record.endDate,
        fuelId: record.fuelId,
        houseIds: record.houseIds.map(String),
        billedFuelKWh: record.quantity * perUnitKWh,
        nonHeatingFuelKWhPerDay: (record.nonHeatingPerDay ?? 0) * perUnitKWh,
        climate: context.climate,
        climateFrom: log ? 'temperature-log' : 'normals',
      });
      snapshotRecords.push({
        id: record.id,
        fuelId: record.fuelId,
        quantity: record.quantity,
        quantityUnit: record.quantityUnit,
        fuelEnergyKWh: record.quantity * perUnitKWh,
        startDate: record.startDate,
        endDate: record.endDate,
        houseIds: record.houseIds,
        nonHeatingPerDay: record.nonHeatingPerDay,
        climateFrom: log ? 'temperature-log' : 'normals',
        temperatureLogId: log?.id ?? null,
      });
    }

    const engineResult = calibrateHeatLoss({ site: site!, houses, periods }, ref, this.sun.cache);
    const inputs: CalibrationInputsSnapshot = { records: snapshotRecords, houses: snapshotHouses, skipped };
    const logNames = new Map(logs.map((log) => [log.id, log.name]));
    return { inputs, result: storedResult(engineResult, usable, snapshotRecords, logNames, skipped) };
  }
}

function storedResult(
  result: CalibrationResult,
  records: FuelRecordDto[],
  snapshot: CalibrationInputsSnapshot['records'],
  logNames: Map<number, string>,
  skipped: CalibrationInputsSnapshot['skipped'],
): StoredCalibrationResult {
  const byId = new Map(records.map((record) => [String(record.id), record]));
  const snapshotById = new Map(snapshot.map((record) => [String(record.id), record]));
  const meters: StoredMeter[] = result.meters.map((meter) => ({
    key: meter.key,
    fuelId: meter.fuelId,
    fuelLabel: meter.fuelLabel,
    houseIds: meter.houseIds.map(Number),
    houseNames: meter.houseNames,
    fitted: meter.fitted,
    refusal: meter.refusal,
    factor: meter.factor,
    factorLow90: meter.factorLow90,
    factorHigh90: meter.factorHigh90,
    standardError: meter.standardError,
    degreesOfFreedom: meter.degreesOfFreedom,
    nmbePercent: meter.nmbePercent,
    cvRmsePercent: meter.cvRmsePercent,
    meetsGuideline14: meter.meetsGuideline14,
    verdict: meter.verdict,
    meaning: meter.meaning,
    periods: meter.periods.map((period) => {
      const record = byId.get(period.id)!;
      const logId = snapshotById.get(period.id)?.temperatureLogId ?? null;
      const perKWh = record.quantity / period.billedFuelKWh;
      return {
        recordId: record.id,
        startDate: period.startDate,
        endDate: period.endDate,
        days: period.days,
        climateFrom: period.climateFrom,
        temperatureLogName: logId === null ? null : (logNames.get(logId) ?? null),
        quantityUnit: record.quantityUnit,
        billedQuantity: record.quantity,
        handbookQuantity: period.handbookFuelKWh * perKWh,
        fittedQuantity: period.fittedFuelKWh === null ? null : period.fittedFuelKWh * perKWh,
        billedFuelKWh: period.billedFuelKWh,
        handbookFuelKWh: period.handbookFuelKWh,
        fittedFuelKWh: period.fittedFuelKWh,
        nonHeatingFuelKWh: period.nonHeatingFuelKWh,
        usedInFit: period.usedInFit,
        note: period.note,
      };
    }),
  }));
  const notes = [...result.notes, ...skipped.map((item) => item.reason)];
  if (meters.some((meter) => meter.periods.some((period) => period.climateFrom === 'normals'))) {
    notes.push(
      "Bills whose days no temperature log covers are modelled on the farm's climate normals (marked in the table): a real winter differs from the normal one, so those bills fit less closely.",
    );
  }
  return {
    meters,
    houses: result.houses.map((house) => ({ ...house, houseId: Number(house.houseId) })),
    notes,
  };
}

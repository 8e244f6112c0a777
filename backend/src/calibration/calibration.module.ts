import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { FarmsModule } from '../farms/farms.module';
import { House } from '../houses/models/house.model';
import { SeasonModule } from '../season/season.module';
import { TemperatureLog } from '../temperature-logs/models/temperature-log.model';
import { CalibrationController } from './calibration.controller';
import { CalibrationService } from './calibration.service';
import { FuelRecordsController } from './fuel-records.controller';
import { FuelRecordsService } from './fuel-records.service';
import { FuelRecord, FuelRecordHouse } from './models/fuel-record.model';
import { SavedCalibration } from './models/saved-calibration.model';

/** Fuel bills and the calibration of each house's heat loss against them. */
@Module({
  imports: [
    SequelizeModule.forFeature([FuelRecord, FuelRecordHouse, SavedCalibration, House, TemperatureLog]),
    FarmsModule,
    SeasonModule,
  ],
  controllers: [FuelRecordsController, CalibrationController],
  providers: [FuelRecordsService, CalibrationService],
  exports: [CalibrationService],
})
export class CalibrationModule {}

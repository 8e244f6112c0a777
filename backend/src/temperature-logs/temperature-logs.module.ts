import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { FarmsModule } from '../farms/farms.module';
import { TemperatureLog } from './models/temperature-log.model';
import { TemperatureLogsController } from './temperature-logs.controller';
import { TemperatureLogsService } from './temperature-logs.service';
import { TemperatureCsvWorkers } from './csv/temperature-csv-workers';

@Module({
  imports: [SequelizeModule.forFeature([TemperatureLog]), FarmsModule],
  controllers: [TemperatureLogsController],
  providers: [TemperatureLogsService, TemperatureCsvWorkers],
  exports: [TemperatureLogsService],
})
export class TemperatureLogsModule {}

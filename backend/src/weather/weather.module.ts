import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { ClimateModule } from '../climate/climate.module';
import { FarmsModule } from '../farms/farms.module';
import { Farm } from '../farms/models/farm.model';
import { ReferenceDataModule } from '../reference-data/reference-data.module';
import { TemperatureLogsModule } from '../temperature-logs/temperature-logs.module';
import { WeatherYear } from './models/weather-year.model';
import { LogClimateController } from './log-climate.controller';
import { LogClimateService } from './log-climate.service';
import { WeatherController } from './weather.controller';
import { WeatherService } from './weather.service';

@Module({
  imports: [
    SequelizeModule.forFeature([WeatherYear, Farm]),
    FarmsModule,
    ClimateModule,
    ReferenceDataModule,
    TemperatureLogsModule,
  ],
  controllers: [WeatherController, LogClimateController],
  providers: [WeatherService, LogClimateService],
  exports: [WeatherService],
})
export class WeatherModule {}

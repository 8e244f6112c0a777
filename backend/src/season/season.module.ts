import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { AlternativesModule } from '../alternatives/alternatives.module';
import { ClimateModule } from '../climate/climate.module';
import { FarmsModule } from '../farms/farms.module';
import { HousesModule } from '../houses/houses.module';
import { TemperatureLogsModule } from '../temperature-logs/temperature-logs.module';
import { CalendarService } from './calendar.service';
import { FuelPricesService } from './fuel-prices.service';
import { FarmFuelPrice } from './models/farm-fuel-price.model';
import { HouseCalendar } from './models/house-calendar.model';
import { HouseMeasurePlan } from './models/house-measure-plan.model';
import { MeasurePlanController } from './measure-plan.controller';
import { MeasurePlanService } from './measure-plan.service';
import { SavedCalibration } from '../calibration/models/saved-calibration.model';
import { HeatLossBasisService } from './heat-loss-basis.service';
import { SeasonBudgetService } from './season-budget.service';
import { SeasonInputsService } from './season-inputs.service';
import { SeasonController } from './season.controller';
import { SeasonService } from './season.service';
import { SunCacheService } from './sun-cache.service';

/** Season engine over HTTP; brings the temperature-log routes with it (one entry in AppModule). */
@Module({
  imports: [
    SequelizeModule.forFeature([FarmFuelPrice, HouseCalendar, HouseMeasurePlan, SavedCalibration]),
    FarmsModule,
    HousesModule,
    AlternativesModule,
    ClimateModule,
    TemperatureLogsModule,
  ],
  controllers: [SeasonController, MeasurePlanController],
  providers: [
    SunCacheService,
    SeasonInputsService,
    SeasonService,
    SeasonBudgetService,
    CalendarService,
    FuelPricesService,
    MeasurePlanService,
    HeatLossBasisService,
  ],
  exports: [SeasonService, SeasonInputsService, SunCacheService, HeatLossBasisService],
})
export class SeasonModule {}

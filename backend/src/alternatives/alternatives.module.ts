import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { FarmsModule } from '../farms/farms.module';
import { HousesModule } from '../houses/houses.module';
import { House } from '../houses/models/house.model';
import { HouseCalendar } from '../season/models/house-calendar.model';
import { AlternativesController } from './alternatives.controller';
import { AlternativesService } from './alternatives.service';
import { HouseAlternative } from './models/house-alternative.model';

@Module({
  imports: [SequelizeModule.forFeature([HouseAlternative, HouseCalendar, House]), FarmsModule, HousesModule],
  controllers: [AlternativesController],
  providers: [AlternativesService],
  exports: [AlternativesService],
})
export class AlternativesModule {}

import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { FarmsModule } from '../farms/farms.module';
import { ClimateController } from './climate.controller';
import { ClimateService } from './climate.service';
import { FarmClimate } from './models/farm-climate.model';

@Module({
  imports: [SequelizeModule.forFeature([FarmClimate]), FarmsModule],
  controllers: [ClimateController],
  providers: [ClimateService],
  exports: [ClimateService],
})
export class ClimateModule {}

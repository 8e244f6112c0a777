import { Module } from '@nestjs/common';
import { ClimateModule } from '../climate/climate.module';
import { FarmsModule } from '../farms/farms.module';
import { HousesModule } from '../houses/houses.module';
import { EstimatesController } from './estimates.controller';
import { EstimatesService } from './estimates.service';

@Module({
  imports: [FarmsModule, HousesModule, ClimateModule],
  controllers: [EstimatesController],
  providers: [EstimatesService],
  exports: [EstimatesService],
})
export class EstimatesModule {}

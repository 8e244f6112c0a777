import { Module } from '@nestjs/common';
import { AlternativesModule } from '../alternatives/alternatives.module';
import { EstimatesModule } from '../estimates/estimates.module';
import { HousesModule } from '../houses/houses.module';
import { SeasonModule } from '../season/season.module';
import { SideBySideController } from './side-by-side.controller';
import { SideBySideService } from './side-by-side.service';

/** The house and its alternatives compared side by side (also in a report's snapshot). */
@Module({
  imports: [HousesModule, AlternativesModule, EstimatesModule, SeasonModule],
  controllers: [SideBySideController],
  providers: [SideBySideService],
  exports: [SideBySideService],
})
export class SideBySideModule {}

import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { ClimateModule } from '../climate/climate.module';
import { EstimatesModule } from '../estimates/estimates.module';
import { FarmsModule } from '../farms/farms.module';
import { HousesModule } from '../houses/houses.module';
import { MailModule } from '../mail/mail.module';
import { SeasonModule } from '../season/season.module';
import { SideBySideModule } from '../side-by-side/side-by-side.module';
import { UsersModule } from '../users/users.module';
import { Report } from './models/report.model';
import { ReportsController } from './reports.controller';
import { ReportsService } from './reports.service';

@Module({
  imports: [
    SequelizeModule.forFeature([Report]),
    FarmsModule,
    HousesModule,
    EstimatesModule,
    SeasonModule,
    SideBySideModule,
    ClimateModule,
    UsersModule,
    MailModule,
  ],
  controllers: [ReportsController],
  providers: [ReportsService],
  exports: [ReportsService],
})
export class ReportsModule {}

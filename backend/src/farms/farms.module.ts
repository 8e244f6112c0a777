import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { House } from '../houses/models/house.model';
import { UsersModule } from '../users/users.module';
import { FarmAccessService } from './farm-access.service';
import { FarmsController } from './farms.controller';
import { FarmsService } from './farms.service';
import { Farm } from './models/farm.model';
import { Membership } from './models/membership.model';

@Module({
  imports: [SequelizeModule.forFeature([Farm, Membership, House]), UsersModule],
  controllers: [FarmsController],
  providers: [FarmsService, FarmAccessService],
  exports: [FarmAccessService, SequelizeModule],
})
export class FarmsModule {}

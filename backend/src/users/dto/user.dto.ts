import { Omittable } from '../../common/validation';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsString, Length } from 'class-validator';
import { SITE_ROLES, type SiteRole } from '../../common/permissions';
import type { UnitSystem } from '../models/user.model';

export class UserDto {
  @ApiProperty() id: number;
  @ApiProperty() email: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: SITE_ROLES }) siteRole: SiteRole;
  @ApiProperty({ enum: ['si', 'us'], description: 'How numbers are shown: SI or US customary' }) unitSystem: UnitSystem;
}

export class UpdateMeDto {
  @ApiPropertyOptional() @Omittable() @IsString() @Length(1, 120) name?: string;
  @ApiPropertyOptional({ enum: ['si', 'us'] }) @Omittable() @IsIn(['si', 'us']) unitSystem?: UnitSystem;
}

export class AdminUpdateUserDto {
  @ApiPropertyOptional() @Omittable() @IsString() @Length(1, 120) name?: string;
  @ApiPropertyOptional({ enum: SITE_ROLES }) @Omittable() @IsIn(SITE_ROLES) siteRole?: SiteRole;
}

export class DeleteMeDto {
  @ApiProperty({ description: 'your current password, to confirm' }) @IsString() @Length(1, 200) password: string;
}

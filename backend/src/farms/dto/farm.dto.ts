import { ApiProperty, PartialType } from '@nestjs/swagger';
import {
  IsIn,
  IsNumber,
  IsString,
  Length,
  Max,
  Min,
  Validate,
  ValidatorConstraint,
  type ValidatorConstraintInterface,
} from 'class-validator';
import { FARM_ROLES, PERMISSIONS, type FarmRole, type Permission } from '../../common/permissions';
import { BOUNDS, isCurrencyCode } from '@thermbay/engine/vocabulary';
import { Omittable } from '../../common/validation';

@ValidatorConstraint({ name: 'ianaTimeZone' })
export class IsIanaTimeZone implements ValidatorConstraintInterface {
  validate(value: unknown): boolean {
    if (typeof value !== 'string' || value.length === 0) return false;
    try {
      new Intl.DateTimeFormat('en', { timeZone: value });
      return true;
    } catch {
      return false;
    }
  }
  defaultMessage(): string {
    return 'timeZone must be an IANA time zone such as America/Chicago';
  }
}

@ValidatorConstraint({ name: 'currencyCode' })
export class IsCurrencyCode implements ValidatorConstraintInterface {
  validate(value: unknown): boolean {
    return isCurrencyCode(value);
  }
  defaultMessage(): string {
    return 'The currency must be a three-letter ISO 4217 code such as USD, EUR or CAD';
  }
}

export class CreateFarmDto {
  @ApiProperty({ example: 'North Ridge Produce' }) @IsString() @Length(1, 120) name: string;

  @ApiProperty({
    minimum: BOUNDS.latitudeDeg.min,
    maximum: BOUNDS.latitudeDeg.max,
    description: 'degrees, north positive',
  })
  @IsNumber()
  @Min(BOUNDS.latitudeDeg.min)
  @Max(BOUNDS.latitudeDeg.max)
  latitudeDeg: number;

  @ApiProperty({
    minimum: BOUNDS.longitudeDeg.min,
    maximum: BOUNDS.longitudeDeg.max,
    description: 'degrees, east positive',
  })
  @IsNumber()
  @Min(BOUNDS.longitudeDeg.min)
  @Max(BOUNDS.longitudeDeg.max)
  longitudeDeg: number;

  @ApiProperty({ minimum: BOUNDS.elevationM.min, maximum: BOUNDS.elevationM.max, description: 'm above sea level' })
  @IsNumber()
  @Min(BOUNDS.elevationM.min)
  @Max(BOUNDS.elevationM.max)
  elevationM: number;

  @ApiProperty({ example: 'America/Chicago' }) @Validate(IsIanaTimeZone) timeZone: string;

  @ApiProperty({
    required: false,
    example: 'EUR',
    description: 'ISO 4217 code every amount of the farm is written in (default USD)',
  })
  @Omittable()
  @Validate(IsCurrencyCode)
  currency?: string;
}

export class UpdateFarmDto extends PartialType(CreateFarmDto, { skipNullProperties: false }) {}

export class FarmDto {
  @ApiProperty() id: number;
  @ApiProperty() name: string;
  @ApiProperty() latitudeDeg: number;
  @ApiProperty() longitudeDeg: number;
  @ApiProperty() elevationM: number;
  @ApiProperty() timeZone: string;
  @ApiProperty({ example: 'USD', description: 'ISO 4217 code every amount of the farm is written in' })
  currency: string;
  @ApiProperty({ enum: FARM_ROLES }) myRole: FarmRole;
  @ApiProperty({ enum: PERMISSIONS, isArray: true }) permissions: Permission[];
  @ApiProperty() houseCount: number;
  @ApiProperty({ description: 'raised by one on every save; send it back in If-Match to update' }) version: number;
  @ApiProperty() createdAt: string;
  @ApiProperty() updatedAt: string;
}

export class MemberDto {
  @ApiProperty() userId: number;
  @ApiProperty() email: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: FARM_ROLES }) role: FarmRole;
}

export class UpdateMemberDto {
  @ApiProperty({ enum: FARM_ROLES }) @IsIn(FARM_ROLES) role: FarmRole;
}

export class RolePermissionsDto {
  @ApiProperty({ enum: PERMISSIONS, isArray: true }) owner: Permission[];
  @ApiProperty({ enum: PERMISSIONS, isArray: true }) grower: Permission[];
  @ApiProperty({ enum: PERMISSIONS, isArray: true }) adviser: Permission[];
  @ApiProperty({ enum: PERMISSIONS, isArray: true }) viewer: Permission[];
}

export class PermissionsDto {
  @ApiProperty({ type: RolePermissionsDto }) roles: RolePermissionsDto;
}

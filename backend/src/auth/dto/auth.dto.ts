import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsString, Length, MaxLength } from 'class-validator';
import { UserDto } from '../../users/dto/user.dto';

export class LoginDto {
  @ApiProperty({ example: 'grower@example.com' }) @IsEmail() @MaxLength(254) email: string;
  @ApiProperty({ example: 'thermbay-demo' }) @IsString() @Length(1, 200) password: string;
}

export class RegisterDto {
  @ApiProperty() @IsEmail() @MaxLength(254) email: string;
  @ApiProperty({ minLength: 8 }) @IsString() @Length(8, 200) password: string;
  @ApiProperty() @IsString() @Length(1, 120) name: string;
}

export class SessionDto {
  @ApiProperty() accessToken: string;
  @ApiProperty({ type: UserDto }) user: UserDto;
}

export class DemoAccountDto {
  @ApiProperty() email: string;
  @ApiProperty() name: string;
  @ApiProperty() description: string;
}

export class DemoAccountsDto {
  @ApiProperty() enabled: boolean;
  @ApiProperty({ type: String, nullable: true }) password: string | null;
  @ApiProperty({ type: DemoAccountDto, isArray: true }) accounts: DemoAccountDto[];
}

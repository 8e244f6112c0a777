import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsString, Length, MaxLength } from 'class-validator';
import { PASSWORD_RULES } from '@thermbay/engine/vocabulary';
import { UserDto } from '../../users/dto/user.dto';

const PASSWORD_NOTE = `at least ${PASSWORD_RULES.minLength} characters, at most ${PASSWORD_RULES.maxBytes} bytes, not the e-mail address, not a commonly used password`;

export class LoginDto {
  @ApiProperty({ example: 'grower@example.com' }) @IsEmail() @MaxLength(254) email: string;
  @ApiProperty({ example: 'thermbay-demo' }) @IsString() @Length(1, 200) password: string;
}

export class RegisterDto {
  @ApiProperty() @IsEmail() @MaxLength(254) email: string;
  @ApiProperty({ minLength: PASSWORD_RULES.minLength, description: PASSWORD_NOTE })
  @IsString()
  @Length(1, 200)
  password: string;
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

export class ChangePasswordDto {
  @ApiProperty() @IsString() @Length(1, 200) currentPassword: string;
  @ApiProperty({ minLength: PASSWORD_RULES.minLength, description: PASSWORD_NOTE })
  @IsString()
  @Length(1, 200)
  newPassword: string;
}

export class PasswordResetRequestDto {
  @ApiProperty() @IsEmail() @MaxLength(254) email: string;
}

export class PasswordResetDto {
  @ApiProperty({ description: 'the token from the reset link' }) @IsString() @Length(10, 200) token: string;
  @ApiProperty({ minLength: PASSWORD_RULES.minLength, description: PASSWORD_NOTE })
  @IsString()
  @Length(1, 200)
  newPassword: string;
}

export class MessageDto {
  @ApiProperty() message: string;
}

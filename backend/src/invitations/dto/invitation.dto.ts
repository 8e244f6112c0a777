import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsIn, IsString, Length, MaxLength } from 'class-validator';
import { PASSWORD_RULES } from '@thermbay/engine/vocabulary';
import { FARM_ROLES, type FarmRole } from '../../common/permissions';
import { MailOutcomeDto } from '../../mail/dto/mail.dto';

/** Roles an invitation can carry (ownership is given to an existing member on the members list). */
export const INVITABLE_ROLES = FARM_ROLES.filter((role) => role !== 'owner') as Exclude<FarmRole, 'owner'>[];

export class CreateInvitationDto {
  @ApiProperty() @IsEmail({}, { message: 'email must be an e-mail address' }) @MaxLength(254) email: string;
  @ApiProperty({ enum: INVITABLE_ROLES }) @IsIn(INVITABLE_ROLES) role: Exclude<FarmRole, 'owner'>;
}

export class InvitationDto {
  @ApiProperty() id: number;
  @ApiProperty() farmId: number;
  @ApiProperty() email: string;
  @ApiProperty({ enum: FARM_ROLES }) role: FarmRole;
  @ApiProperty({ type: String, nullable: true }) invitedByName: string | null;
  @ApiProperty() createdAt: string;
  @ApiProperty() expiresAt: string;
  @ApiProperty({ description: 'the link no longer works (7 days passed); resend to renew it' }) expired: boolean;
}

/** The invitation as the owner sees it after inviting or resending, with how the e-mail went. */
export class InvitationSentDto extends InvitationDto {
  @ApiProperty({ type: MailOutcomeDto }) mail: MailOutcomeDto;
}

/** What the person holding the link is shown. */
export class InvitationPreviewDto {
  @ApiProperty() farmName: string;
  @ApiProperty({ enum: FARM_ROLES }) role: FarmRole;
  @ApiProperty() email: string;
  @ApiProperty({ type: String, nullable: true }) invitedByName: string | null;
  @ApiProperty() expiresAt: string;
  @ApiProperty({ description: 'an account already uses the address: sign in to accept' }) accountExists: boolean;
}

export class InvitedSignUpDto {
  @ApiProperty() @IsString() @Length(1, 120) name: string;
  @ApiProperty({ minLength: PASSWORD_RULES.minLength }) @IsString() @Length(1, 200) password: string;
}

export class AcceptedInvitationDto {
  @ApiProperty() farmId: number;
  @ApiProperty({ enum: FARM_ROLES }) role: FarmRole;
}

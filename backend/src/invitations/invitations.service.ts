import {
  BadRequestException,
  ConflictException,
  ForbiddenException,
  Injectable,
  NotFoundException,
} from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { Op } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { AuthService } from '../auth/auth.service';
import type { SessionDto } from '../auth/dto/auth.dto';
import { assertAcceptablePassword } from '../auth/password-policy';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { hashLinkToken, newLinkToken } from '../common/tokens';
import { FarmAccessService } from '../farms/farm-access.service';
import { Farm } from '../farms/models/farm.model';
import { Membership } from '../farms/models/membership.model';
import { MailService } from '../mail/mail.service';
import { User } from '../users/models/user.model';
import { normaliseEmail, UsersService } from '../users/users.service';
import type {
  AcceptedInvitationDto,
  CreateInvitationDto,
  InvitationDto,
  InvitationPreviewDto,
  InvitationSentDto,
  InvitedSignUpDto,
} from './dto/invitation.dto';
import { Invitation } from './models/invitation.model';

/** How long an invitation link works. */
export const INVITATION_LIFETIME_MS = 7 * 24 * 3600 * 1000;

const LINK_NOT_VALID =
  'This invitation link is not valid: it was used already, revoked, has expired or was mistyped. Ask the farm owner to send a new one.';

const ROLE_WORDS: Record<string, string> = {
  grower: 'a grower (edits houses and runs estimates)',
  adviser: 'an adviser (reads the farm, runs estimates and writes reports)',
  viewer: 'a viewer (reads the farm)',
  owner: 'an owner',
};

@Injectable()
export class InvitationsService {
  constructor(
    @InjectModel(Invitation) private readonly invitations: typeof Invitation,
    @InjectModel(Membership) private readonly memberships: typeof Membership,
    @InjectModel(Farm) private readonly farms: typeof Farm,
    @InjectModel(User) private readonly userModel: typeof User,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly access: FarmAccessService,
    private readonly users: UsersService,
    private readonly auth: AuthService,
    private readonly mail: MailService,
  ) {}

  async invite(user: AuthenticatedUser, farmId: number, body: CreateInvitationDto): Promise<InvitationSentDto> {
    await this.access.require(user, farmId, 'members:manage');
    const email = normaliseEmail(body.email);
    // Answer the same whether or not the address has an account; only a present member is named,
    // and the members list shows those anyway.
    const member = await this.memberships.findOne({ where: { farmId }, include: [{ model: User, where: { email } }] });
    if (member) throw new BadRequestException('That person is already a member of this farm');
    // a newer invitation to the same address replaces any still pending
    await this.invitations.update(
      { revokedAt: new Date() },
      { where: { farmId, email, acceptedAt: { [Op.is]: null }, revokedAt: { [Op.is]: null } } },
    );
    const { token, tokenHash } = newLinkToken();
    const invitation = await this.invitations.create({
      farmId,
      email,
      role: body.role,
      tokenHash,
      invitedByUserId: user.id,
      expiresAt: new Date(Date.now() + INVITATION_LIFETIME_MS),
    });
    return this.sendLink(user, invitation, token);
  }

  async pending(user: AuthenticatedUser, farmId: number): Promise<InvitationDto[]> {
    await this.access.require(user, farmId, 'members:manage');
    const rows = await this.invitations.findAll({
      where: { farmId, acceptedAt: { [Op.is]: null }, revokedAt: { [Op.is]: null } },
      order: [['id', 'DESC']],
    });
    return Promise.all(rows.map((row) => this.toDto(row)));
  }

  async revoke(user: AuthenticatedUser, farmId: number, invitationId: number): Promise<void> {
    await this.access.require(user, farmId, 'members:manage');
    const invitation = await this.pendingOf(farmId, invitationId);
    await invitation.update({ revokedAt: new Date() });
  }

  /** A new link (the old one stops working) valid for another 7 days, sent again. */
  async resend(user: AuthenticatedUser, farmId: number, invitationId: number): Promise<InvitationSentDto> {
    await this.access.require(user, farmId, 'members:manage');
    const invitation = await this.pendingOf(farmId, invitationId);
    const { token, tokenHash } = newLinkToken();
    await invitation.update({ tokenHash, expiresAt: new Date(Date.now() + INVITATION_LIFETIME_MS) });
    return this.sendLink(user, invitation, token);
  }

  async preview(token: string): Promise<InvitationPreviewDto> {
    const invitation = await this.usable(token);
    const farm = await this.farms.findByPk(invitation.farmId);
    if (!farm) throw new NotFoundException(LINK_NOT_VALID);
    return {
      farmName: farm.name,
      role: invitation.role,
      email: invitation.email,
      invitedByName: await this.inviterName(invitation),
      expiresAt: invitation.expiresAt.toISOString(),
      accountExists: (await this.users.findByEmail(invitation.email)) !== null,
    };
  }

  /** A new person: the account (with the invitation's address) and the membership, together. */
  async signUp(token: string, body: InvitedSignUpDto): Promise<SessionDto> {
    const invitation = await this.usable(token);
    if (await this.users.findByEmail(invitation.email)) {
      throw new ConflictException('An account already uses this address: sign in, then open the link again to accept');
    }
    assertAcceptablePassword(body.password, invitation.email, 'password');
    const user = await this.sequelize.transaction(async (transaction) => {
      await this.claim(invitation, transaction);
      const created = await this.auth.createUser(invitation.email, body.name, body.password, transaction);
      await this.memberships.create(
        { farmId: invitation.farmId, userId: created.id, role: invitation.role },
        { transaction },
      );
      await invitation.update({ acceptedByUserId: created.id }, { transaction });
      return created;
    });
    return this.auth.sessionFor(user);
  }

  /** An existing account (signed in, with the invited address) joins the farm. */
  async accept(user: AuthenticatedUser, token: string): Promise<AcceptedInvitationDto> {
    const invitation = await this.usable(token);
    if (normaliseEmail(user.email) !== invitation.email) {
      throw new ForbiddenException(
        `This invitation is for ${invitation.email}; you are signed in as ${user.email}. Sign in with the invited address.`,
      );
    }
    return this.sequelize.transaction(async (transaction) => {
      await this.claim(invitation, transaction);
      await invitation.update({ acceptedByUserId: user.id }, { transaction });
      const existing = await this.memberships.findOne({
        where: { farmId: invitation.farmId, userId: user.id },
        transaction,
      });
      if (existing) return { farmId: invitation.farmId, role: existing.role };
      await this.memberships.create(
        { farmId: invitation.farmId, userId: user.id, role: invitation.role },
        { transaction },
      );
      return { farmId: invitation.farmId, role: invitation.role };
    });
  }

  private async sendLink(user: AuthenticatedUser, invitation: Invitation, token: string): Promise<InvitationSentDto> {
    const farm = await this.farms.findByPk(invitation.farmId);
    const inviter = await this.users.findById(user.id);
    const mail = await this.mail.send({
      kind: 'invitation',
      senderUserId: user.id,
      to: [invitation.email],
      subject: `${inviter.name} invites you to ${farm?.name ?? 'a farm'} on Thermbay`,
      text:
        `Hello,\n\n${inviter.name} (${inviter.email}) invites you to join the farm "${farm?.name}" on Thermbay as ` +
        `${ROLE_WORDS[invitation.role] ?? invitation.role}.\n\n` +
        `Open this link to accept (it works once, until ${invitation.expiresAt.toUTCString()}):\n` +
        `${this.mail.link(`/invitations/${token}`)}\n\n` +
        'New to Thermbay? The link lets you create your account. Already have one? Sign in and the farm is added.\n',
    });
    return { ...(await this.toDto(invitation)), mail: { status: mail.status, error: mail.error } };
  }

  /** Marks the invitation used, once: of two racing requests only one wins. */
  private async claim(invitation: Invitation, transaction: import('sequelize').Transaction): Promise<void> {
    const [claimed] = await this.invitations.update(
      { acceptedAt: new Date() },
      {
        where: { id: invitation.id, acceptedAt: { [Op.is]: null }, revokedAt: { [Op.is]: null } },
        transaction,
      },
    );
    if (claimed !== 1) throw new NotFoundException(LINK_NOT_VALID);
  }

  private async usable(token: string): Promise<Invitation> {
    const invitation = await this.invitations.findOne({ where: { tokenHash: hashLinkToken(token) } });
    if (!invitation || invitation.acceptedAt || invitation.revokedAt || invitation.expiresAt.getTime() <= Date.now()) {
      throw new NotFoundException(LINK_NOT_VALID);
    }
    return invitation;
  }

  private async pendingOf(farmId: number, invitationId: number): Promise<Invitation> {
    const invitation = await this.invitations.findOne({
      where: { id: invitationId, farmId, acceptedAt: { [Op.is]: null }, revokedAt: { [Op.is]: null } },
    });
    if (!invitation) throw new NotFoundException('No such pending invitation');
    return invitation;
  }

  private async inviterName(invitation: Invitation): Promise<string | null> {
    if (invitation.invitedByUserId === null) return null;
    return (await this.userModel.findByPk(invitation.invitedByUserId))?.name ?? null;
  }

  private async toDto(row: Invitation): Promise<InvitationDto> {
    return {
      id: row.id,
      farmId: row.farmId,
      email: row.email,
      role: row.role,
      invitedByName: await this.inviterName(row),
      createdAt: row.createdAt.toISOString(),
      expiresAt: row.expiresAt.toISOString(),
      expired: row.expiresAt.getTime() <= Date.now(),
    };
  }
}

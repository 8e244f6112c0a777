import { BadRequestException, ConflictException, Injectable, UnauthorizedException } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { InjectModel } from '@nestjs/sequelize';
import * as bcrypt from 'bcryptjs';
import { randomBytes } from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import { RequestValidationException } from '../common/filters/all-exceptions.filter';
import { hashLinkToken, newLinkToken } from '../common/tokens';
import { MailService } from '../mail/mail.service';
import { User } from '../users/models/user.model';
import { normaliseEmail, toUserDto, UsersService } from '../users/users.service';
import type {
  ChangePasswordDto,
  LoginDto,
  MessageDto,
  PasswordResetDto,
  PasswordResetRequestDto,
  RegisterDto,
  SessionDto,
} from './dto/auth.dto';
import type { TokenPayload } from './jwt.strategy';
import { PasswordResetToken } from './models/password-reset-token.model';
import { assertAcceptablePassword } from './password-policy';

/** bcrypt cost: about 0.1 s per hash on this hardware class, the usual compromise. */
export const BCRYPT_ROUNDS = 10;

/** How long a password-reset link works. */
export const PASSWORD_RESET_LIFETIME_MS = 60 * 60 * 1000;

/** The same answer whether or not the address has an account. */
export const RESET_REQUESTED_MESSAGE =
  'If an account uses that address, a message with a reset link is on its way. The link works once, for one hour.';

const RESET_LINK_INVALID =
  'This reset link is not valid: it was used already, has expired or was mistyped. Ask for a new one.';

@Injectable()
export class AuthService {
  /**
   * A hash of a random password at the same cost as real ones: an unknown e-mail is checked
   * against it, so that sign-in takes as long for an unknown account as for a wrong password.
   */
  private readonly dummyHash = bcrypt.hash(randomBytes(24).toString('base64'), BCRYPT_ROUNDS);

  constructor(
    @InjectModel(User) private readonly userModel: typeof User,
    @InjectModel(PasswordResetToken) private readonly resetTokens: typeof PasswordResetToken,
    private readonly users: UsersService,
    private readonly jwt: JwtService,
    private readonly mail: MailService,
  ) {}

  async register(body: RegisterDto): Promise<SessionDto> {
    const email = normaliseEmail(body.email);
    assertAcceptablePassword(body.password, email, 'password');
    if (await this.users.findByEmail(email)) throw new ConflictException('An account with that e-mail exists already');
    const user = await this.createUser(email, body.name, body.password);
    return this.sessionFor(user);
  }

  /** A new account with an acceptable password (checked by the caller). */
  async createUser(email: string, name: string, password: string, transaction?: Transaction): Promise<User> {
    return this.userModel.create(
      { email: normaliseEmail(email), name: name.trim(), passwordHash: await bcrypt.hash(password, BCRYPT_ROUNDS) },
      { transaction },
    );
  }

  async login(body: LoginDto): Promise<SessionDto> {
    const user = await this.users.findByEmail(body.email);
    // Same message, and the same bcrypt work, for an unknown e-mail and a wrong password: neither
    // the answer nor its timing tells which accounts exist.
    const passwordMatches = await bcrypt.compare(body.password, user ? user.passwordHash : await this.dummyHash);
    if (!user || !passwordMatches) {
      throw new UnauthorizedException('E-mail or password is not right');
    }
    return this.sessionFor(user);
  }

  async logout(userId: number): Promise<void> {
    await this.userModel.increment('tokenVersion', { where: { id: userId } });
  }

  /** Knowing the current password; every other session ends, this one gets a new token. */
  async changePassword(userId: number, body: ChangePasswordDto): Promise<SessionDto> {
    const user = await this.users.findById(userId);
    if (!(await bcrypt.compare(body.currentPassword, user.passwordHash))) {
      throw new RequestValidationException([
        { field: 'currentPassword', message: 'The current password is not right' },
      ]);
    }
    assertAcceptablePassword(body.newPassword, user.email, 'newPassword');
    if (await bcrypt.compare(body.newPassword, user.passwordHash)) {
      throw new RequestValidationException([
        { field: 'newPassword', message: 'The new password is the same as the current one' },
      ]);
    }
    await this.setPassword(user, body.newPassword);
    await this.mail.send({
      kind: 'password-changed',
      senderUserId: user.id,
      to: [user.email],
      subject: 'Your Thermbay password was changed',
      text:
        `Hello ${user.name},\n\nThe password of your Thermbay account was just changed, and every other ` +
        'session was signed out.\n\nIf you did not do this, reset your password at once: ' +
        `${this.mail.link('/forgot-password')}\n`,
    });
    return this.sessionFor(user);
  }

  /** Sends a reset link when the address has an account; answers the same either way. */
  async requestPasswordReset(body: PasswordResetRequestDto): Promise<MessageDto> {
    const user = await this.users.findByEmail(body.email);
    if (user) {
      const { token, tokenHash } = newLinkToken();
      await this.resetTokens.create({
        userId: user.id,
        tokenHash,
        expiresAt: new Date(Date.now() + PASSWORD_RESET_LIFETIME_MS),
      });
      // A failed send is kept in the send log; the answer must not differ, or it would tell
      // whether the address has an account.
      await this.mail.send({
        kind: 'password-reset',
        senderUserId: null,
        to: [user.email],
        subject: 'Reset your Thermbay password',
        text:
          `Hello ${user.name},\n\nSomeone (we hope you) asked to reset the password of your Thermbay account.\n\n` +
          `Choose a new password here (the link works once, for one hour):\n${this.mail.link(`/reset-password/${token}`)}\n\n` +
          'If you did not ask, ignore this message: your password stays as it is.\n',
      });
    }
    return { message: RESET_REQUESTED_MESSAGE };
  }

  /** Uses a reset token once; every session of the account ends and a new one starts. */
  async resetPassword(body: PasswordResetDto): Promise<SessionDto> {
    const row = await this.resetTokens.findOne({ where: { tokenHash: hashLinkToken(body.token) } });
    if (!row || row.usedAt || row.expiresAt.getTime() <= Date.now()) throw new BadRequestException(RESET_LINK_INVALID);
    const user = await this.users.findById(row.userId);
    assertAcceptablePassword(body.newPassword, user.email, 'newPassword');
    // Claim the token first: of two requests racing with the same link, only one wins.
    const [claimed] = await this.resetTokens.update(
      { usedAt: new Date() },
      { where: { id: row.id, usedAt: { [Op.is]: null } } },
    );
    if (claimed !== 1) throw new BadRequestException(RESET_LINK_INVALID);
    await this.setPassword(user, body.newPassword);
    return this.sessionFor(user);
  }

  private async setPassword(user: User, password: string): Promise<void> {
    await user.update({
      passwordHash: await bcrypt.hash(password, BCRYPT_ROUNDS),
      tokenVersion: user.tokenVersion + 1,
    });
  }

  async sessionFor(user: User): Promise<SessionDto> {
    const payload: TokenPayload = { sub: user.id, tv: user.tokenVersion };
    return { accessToken: await this.jwt.signAsync(payload), user: toUserDto(user) };
  }
}

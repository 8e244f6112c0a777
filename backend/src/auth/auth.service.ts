import { ConflictException, Injectable, UnauthorizedException } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { InjectModel } from '@nestjs/sequelize';
import * as bcrypt from 'bcryptjs';
import { randomBytes } from 'node:crypto';
import { User } from '../users/models/user.model';
import { normaliseEmail, toUserDto, UsersService } from '../users/users.service';
import type { LoginDto, RegisterDto, SessionDto } from './dto/auth.dto';
import type { TokenPayload } from './jwt.strategy';

/** bcrypt cost: about 0.1 s per hash on this hardware class, the usual compromise. */
export const BCRYPT_ROUNDS = 10;

@Injectable()
export class AuthService {
  /**
   * A hash of a random password at the same cost as real ones: an unknown e-mail is checked
   * against it, so that sign-in takes as long for an unknown account as for a wrong password.
   */
  private readonly dummyHash = bcrypt.hash(randomBytes(24).toString('base64'), BCRYPT_ROUNDS);

  constructor(
    @InjectModel(User) private readonly userModel: typeof User,
    private readonly users: UsersService,
    private readonly jwt: JwtService,
  ) {}

  async register(body: RegisterDto): Promise<SessionDto> {
    const email = normaliseEmail(body.email);
    if (await this.users.findByEmail(email)) throw new ConflictException('An account with that e-mail exists already');
    const user = await this.userModel.create({
      email,
      name: body.name.trim(),
      passwordHash: await bcrypt.hash(body.password, BCRYPT_ROUNDS),
    });
    return this.sessionFor(user);
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

  private async sessionFor(user: User): Promise<SessionDto> {
    const payload: TokenPayload = { sub: user.id, tv: user.tokenVersion };
    return { accessToken: await this.jwt.signAsync(payload), user: toUserDto(user) };
  }
}

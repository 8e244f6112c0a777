import { ConflictException, Injectable, UnauthorizedException } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { InjectModel } from '@nestjs/sequelize';
import * as bcrypt from 'bcryptjs';
import { User } from '../users/models/user.model';
import { normaliseEmail, toUserDto, UsersService } from '../users/users.service';
import type { LoginDto, RegisterDto, SessionDto } from './dto/auth.dto';
import type { TokenPayload } from './jwt.strategy';

/** bcrypt cost: about 0.1 s per hash on this hardware class, the usual compromise. */
export const BCRYPT_ROUNDS = 10;

@Injectable()
export class AuthService {
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
    // Same message for unknown e-mail and wrong password: do not reveal which accounts exist.
    if (!user || !(await bcrypt.compare(body.password, user.passwordHash))) {
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

import { Injectable, UnauthorizedException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy } from 'passport-jwt';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import type { Environment } from '../config/environment';
import { UsersService } from '../users/users.service';

export interface TokenPayload {
  sub: number;
  /** the user's tokenVersion when the token was issued */
  tv: number;
}

@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(
    config: ConfigService<Environment, true>,
    private readonly users: UsersService,
  ) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      ignoreExpiration: false,
      secretOrKey: config.get('JWT_SECRET', { infer: true }),
    });
  }

  async validate(payload: TokenPayload): Promise<AuthenticatedUser> {
    const user = await this.users.findById(payload.sub).catch(() => null);
    if (!user || user.tokenVersion !== payload.tv) {
      throw new UnauthorizedException('Your session has ended; please sign in again');
    }
    return { id: user.id, email: user.email, siteRole: user.siteRole };
  }
}

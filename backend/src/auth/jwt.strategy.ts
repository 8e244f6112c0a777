import { Injectable, UnauthorizedException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { PassportStrategy } from '@nestjs/passport';
import { createSecretKey } from 'node:crypto';
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
      // A key object, not the string: given a string, the verifier first tries to read it as a PEM
      // public key on every request (about 2.7 ms of CPU), and only then falls back to HMAC. The verifier
      // takes key objects; passport-jwt's types only say string | Buffer.
      secretOrKey: createSecretKey(config.get('JWT_SECRET', { infer: true }), 'utf8') as unknown as Buffer,
      algorithms: ['HS256'],
    });
  }

  async validate(payload: TokenPayload): Promise<AuthenticatedUser> {
    const user = await this.users.findSession(payload.sub).catch(() => null);
    if (!user || user.tokenVersion !== payload.tv) {
      throw new UnauthorizedException('Your session has ended; please sign in again');
    }
    return { id: user.id, email: user.email, siteRole: user.siteRole };
  }
}

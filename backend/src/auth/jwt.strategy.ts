import { Inject, Injectable } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { APP_CONFIG, AppConfig } from '../config/config';
import { AuthUser } from './auth-user';
import { jwtKey } from './jwt-key';
import { epochCurrent, TokenClaims } from './token-claims';
import { UsersRepository } from '../users/users.repository';

/**
 * Verifies bearer tokens: HS256 only, so a token signed with another algorithm is refused; and the
 * user must still exist with the token's epoch (a password reset ends older tokens).
 */
@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(
    @Inject(APP_CONFIG) config: AppConfig,
    private readonly users: UsersRepository,
  ) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      // jsonwebtoken takes a KeyObject; passport-jwt's types only name string and Buffer.
      secretOrKey: jwtKey(config.jwtSecret) as unknown as Buffer,
      algorithms: ['HS256'],
      ignoreExpiration: false,
    });
  }

  async validate(claims: TokenClaims): Promise<AuthUser | null> {
    if (!epochCurrent(claims, await this.users.tokenEpochOf(claims.sub))) return null;
    return { id: claims.sub, email: claims.email };
  }
}

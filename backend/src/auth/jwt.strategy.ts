import { Inject, Injectable } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { APP_CONFIG, AppConfig } from '../config/config';
import { AuthUser } from './auth-user';
import { jwtKey } from './jwt-key';

interface TokenClaims {
  sub: string;
  email: string;
}

/** Verifies bearer tokens: HS256 only, so a token signed with another algorithm is refused. */
@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(@Inject(APP_CONFIG) config: AppConfig) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      // jsonwebtoken takes a KeyObject; passport-jwt's types only name string and Buffer.
      secretOrKey: jwtKey(config.jwtSecret) as unknown as Buffer,
      algorithms: ['HS256'],
      ignoreExpiration: false,
    });
  }

  validate(claims: TokenClaims): AuthUser {
    return { id: claims.sub, email: claims.email };
  }
}

import { Inject, Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { APP_CONFIG, AppConfig } from '../config/config';
import { DomainError, unauthenticated } from '../common/errors/domain-error';
import { AttemptLimiter } from './attempt-limiter';
import { UserRow, UsersRepository } from '../users/users.repository';
import { DUMMY_HASH, verifyPassword } from './passwords';
import { TokenClaims } from './token-claims';

export interface AuthPayload {
  token: string;
  user: UserRow;
}

@Injectable()
export class AuthService {
  private readonly limiter = new AttemptLimiter();

  constructor(
    private readonly users: UsersRepository,
    private readonly jwt: JwtService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /** Check e-mail and password; the same error for an unknown e-mail and a wrong password. */
  async signIn(email: string, password: string, clientAddress: string): Promise<AuthPayload> {
    const keys = [`email:${email.trim().toLowerCase()}`, `ip:${clientAddress}`];
    const wait = this.limiter.retryAfterSeconds(keys);
    if (wait > 0) throw new DomainError('TOO_MANY_REQUESTS', `too many failed sign-ins; try again in ${Math.ceil(wait / 60)} minutes`);
    const user = await this.users.findByEmail(email.trim());
    const ok = await verifyPassword(password, user?.passwordHash ?? DUMMY_HASH);
    if (!user || !user.passwordHash || !ok) {
      this.limiter.record(keys);
      throw unauthenticated('e-mail or password is wrong');
    }
    this.limiter.recordSuccess(keys);
    return this.issue(user);
  }

  /** A signed token for a user (after sign-in, accepting an invitation). */
  issue(user: UserRow): AuthPayload {
    const token = this.jwt.sign(
      { sub: user.id, email: user.email, epoch: user.tokenEpoch } satisfies TokenClaims,
      { algorithm: 'HS256', expiresIn: this.config.jwtExpiresInSeconds },
    );
    return { token, user };
  }
}

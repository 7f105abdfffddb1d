import { Inject, Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { APP_CONFIG, AppConfig } from '../config/config';
import { unauthenticated } from '../common/errors/domain-error';
import { requireBoundedCredentials } from './account-rules';
import { AttemptThrottle } from './attempt-throttle';
import { UserRow, UsersRepository } from '../users/users.repository';
import { DUMMY_HASH, verifyPassword } from './passwords';
import { TokenClaims } from './token-claims';

export interface AuthPayload {
  token: string;
  user: UserRow;
}

@Injectable()
export class AuthService {
  constructor(
    private readonly throttle: AttemptThrottle,
    private readonly users: UsersRepository,
    private readonly jwt: JwtService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /**
   * Check e-mail and password; the same error for an unknown e-mail and a wrong password.
   * Failures are throttled per (e-mail, client) and per client (AttemptThrottle), never locked
   * per address, so nobody's failures refuse someone else's right password.
   */
  async signIn(email: string, password: string, clientAddress: string): Promise<AuthPayload> {
    requireBoundedCredentials(email, password);
    await this.throttle.checkSignIn(email, clientAddress);
    const user = await this.users.findByEmail(email.trim());
    const ok = await verifyPassword(password, user?.passwordHash ?? DUMMY_HASH);
    if (!user || !user.passwordHash || !ok) {
      await this.throttle.recordSignInFailure(email, clientAddress);
      throw unauthenticated('e-mail or password is wrong');
    }
    await this.throttle.recordSignInSuccess(email, clientAddress);
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

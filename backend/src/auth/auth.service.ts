import { Inject, Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { APP_CONFIG, AppConfig } from '../config/config';
import { unauthenticated } from '../common/errors/domain-error';
import { UserRow, UsersRepository } from '../users/users.repository';
import { DUMMY_HASH, verifyPassword } from './passwords';

export interface AuthPayload {
  token: string;
  user: UserRow;
}

@Injectable()
export class AuthService {
  constructor(
    private readonly users: UsersRepository,
    private readonly jwt: JwtService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /** Check e-mail and password; the same error for an unknown e-mail and a wrong password. */
  async signIn(email: string, password: string): Promise<AuthPayload> {
    const user = await this.users.findByEmail(email.trim());
    const ok = await verifyPassword(password, user?.passwordHash ?? DUMMY_HASH);
    if (!user || !user.passwordHash || !ok) throw unauthenticated('e-mail or password is wrong');
    return this.issue(user);
  }

  /** A signed token for a user (after sign-in, accepting an invitation). */
  issue(user: UserRow): AuthPayload {
    const token = this.jwt.sign(
      { sub: user.id, email: user.email },
      { algorithm: 'HS256', expiresIn: this.config.jwtExpiresInSeconds },
    );
    return { token, user };
  }
}

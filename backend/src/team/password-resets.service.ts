import { Inject, Injectable } from '@nestjs/common';
import { AuditService } from '../audit/audit.service';
import { normaliseEmail, requireBoundedCredentials, requirePasswordLength } from '../auth/account-rules';
import { AttemptThrottle } from '../auth/attempt-throttle';
import { hashPassword } from '../auth/passwords';
import { badInput } from '../common/errors/domain-error';
import { hashToken, issueToken, PASSWORD_RESET_LIFETIME_MS, TokenRefusal, tokenRefusal } from '../common/one-time-token';
import { APP_CONFIG, AppConfig } from '../config/config';
import { DatabaseService } from '../database/database.service';
import { passwordResetMail } from '../mail/mail-templates';
import { MailService } from '../mail/mail.service';
import { UsersRepository } from '../users/users.repository';
import { ResetPasswordInput } from './dto/reset-password.input';
import { PasswordResetsRepository } from './password-resets.repository';

const REFUSALS: Record<TokenRefusal | 'unknown', string> = {
  unknown: 'this reset link is not valid; check it was copied whole',
  used: 'this reset link was already used; ask for a new one',
  expired: 'this reset link has expired; ask for a new one',
};

@Injectable()
export class PasswordResetsService {
  constructor(
    private readonly throttle: AttemptThrottle,
    private readonly database: DatabaseService,
    private readonly resets: PasswordResetsRepository,
    private readonly users: UsersRepository,
    private readonly audit: AuditService,
    private readonly mail: MailService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /**
   * E-mail a one-hour reset link when the address has an account. The answer is true either way
   * so it does not reveal who has an account; a broken mail server is reported in both cases.
   * Requests are limited per address and per client, so nobody can flood an inbox.
   */
  async requestReset(emailInput: string, clientAddress: string): Promise<true> {
    requireBoundedCredentials(emailInput);
    const email = normaliseEmail(emailInput);
    await this.throttle.takeResetRequest(email, clientAddress);
    const user = await this.users.findByEmail(email);
    if (!user) {
      await this.mail.checkReachable();
      return true;
    }
    const now = new Date();
    const issued = issueToken(PASSWORD_RESET_LIFETIME_MS, now);
    await this.database.transaction(async (tx) => {
      await this.resets.expireOpen(user.id, now, tx);
      const reset = await this.resets.insert({ userId: user.id, tokenHash: issued.tokenHash, expiresAt: issued.expiresAt }, tx);
      await this.audit.record(tx, {
        actor: null, projectId: null, action: 'create', objectType: 'password_reset', objectId: reset.id,
        after: { userId: user.id, expiresAt: reset.expiresAt },
      });
      const link = `${this.config.publicUrl}/reset-password?token=${encodeURIComponent(issued.token)}`;
      await this.mail.send(user.email, passwordResetMail({ displayName: user.displayName, link, expiresAt: issued.expiresAt }));
    });
    return true;
  }

  /**
   * Set a new password with a reset token; single-use, and any other open reset ends too. The
   * address's sign-in failures are forgotten, from every client.
   */
  async resetPassword(input: ResetPasswordInput): Promise<true> {
    const userId = await this.database.transaction(async (tx) => {
      const now = new Date();
      const reset = await this.resets.findByTokenHashForUpdate(hashToken(input.token.trim()), tx);
      if (!reset) throw badInput('token', REFUSALS.unknown);
      const refusal = tokenRefusal(reset, now);
      if (refusal) throw badInput('token', REFUSALS[refusal]);
      requirePasswordLength(input.password);
      if (!(await this.resets.markUsed(reset.id, now, tx))) throw badInput('token', REFUSALS.used);
      await this.resets.expireOpen(reset.userId, now, tx);
      await this.users.setPasswordHash(reset.userId, await hashPassword(input.password), tx);
      await this.audit.record(tx, {
        actor: null, projectId: null, action: 'reset', objectType: 'user', objectId: reset.userId,
        after: { passwordResetId: reset.id },
      });
      return reset.userId;
    });
    const user = await this.users.findById(userId);
    if (user) await this.throttle.clearSignIns(user.email);
    return true;
  }
}

import { Injectable } from '@nestjs/common';
import { AuditService } from '../audit/audit.service';
import { normaliseEmail, requireBoundedCredentials, requirePasswordLength } from '../auth/account-rules';
import { AttemptThrottle } from '../auth/attempt-throttle';
import { hashPassword } from '../auth/passwords';
import { badInput } from '../common/errors/domain-error';
import { hashToken, TokenRefusal, tokenRefusal } from '../common/one-time-token';
import { DatabaseService } from '../database/database.service';
import { JobQueueService } from '../jobs/job-queue.service';
import { UsersRepository } from '../users/users.repository';
import { ResetPasswordInput } from './dto/reset-password.input';
import { PasswordResetMailJob } from './password-reset-mail.job';
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
    private readonly jobs: JobQueueService,
    private readonly mailJob: PasswordResetMailJob,
  ) {}

  /**
   * Ask for a one-hour reset link by e-mail. The answer is true at once and the same for every
   * address: whether it has an account, the link and the mail are the job's, after the answer
   * (PasswordResetMailJob), so neither the answer nor its time tells who has an account. Requests
   * are limited per address and per client, so nobody can flood an inbox.
   */
  async requestReset(emailInput: string, clientAddress: string): Promise<true> {
    requireBoundedCredentials(emailInput);
    const email = normaliseEmail(emailInput);
    await this.throttle.takeResetRequest(email, clientAddress);
    await this.jobs.send(this.mailJob, { email });
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

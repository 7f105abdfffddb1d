import { Inject, Injectable, OnModuleInit } from '@nestjs/common';
import { AuditService } from '../audit/audit.service';
import { issueToken, PASSWORD_RESET_LIFETIME_MS } from '../common/one-time-token';
import { APP_CONFIG, AppConfig } from '../config/config';
import { DatabaseService } from '../database/database.service';
import { JobRegistry } from '../jobs/job-registry';
import { TaskKind } from '../jobs/run-kind';
import { passwordResetMail } from '../mail/mail-templates';
import { MailService } from '../mail/mail.service';
import { UsersRepository } from '../users/users.repository';
import { PasswordResetsRepository } from './password-resets.repository';

/** What a reset request's job carries: the normalised address as it was asked for. */
export interface PasswordResetMailPayload {
  email: string;
}

/**
 * Issues and mails a password reset in a worker process, so `requestPasswordReset` answers at once
 * and alike for every address: the account lookup, the token, its row and the SMTP exchange happen
 * here, after the answer (issue 17: the answer time revealed whether an address had an account).
 * An address without an account gets nothing. A mail server that fails rolls the reset back and
 * pg-boss retries the job; a retry issues a fresh link, and any earlier open one ends.
 */
@Injectable()
export class PasswordResetMailJob implements TaskKind<PasswordResetMailPayload>, OnModuleInit {
  readonly type = 'task';
  readonly queue = 'password-reset-mail';
  /** A reset link is worth little after some minutes: a few retries, then the person asks again. */
  readonly sendOptions = { retryLimit: 3, retryDelay: 20, retryBackoff: true, expireInSeconds: 120 };

  constructor(
    private readonly registry: JobRegistry,
    private readonly database: DatabaseService,
    private readonly resets: PasswordResetsRepository,
    private readonly users: UsersRepository,
    private readonly audit: AuditService,
    private readonly mail: MailService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  onModuleInit(): void {
    this.registry.register(this);
  }

  async handle({ email }: PasswordResetMailPayload): Promise<void> {
    const user = await this.users.findByEmail(email);
    if (!user) return;
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
  }
}

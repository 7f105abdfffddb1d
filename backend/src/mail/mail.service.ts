import { Inject, Injectable, Logger, OnModuleDestroy } from '@nestjs/common';
import { createTransport, Transporter } from 'nodemailer';
import { unavailable } from '../common/errors/domain-error';
import { APP_CONFIG, AppConfig } from '../config/config';
import { MailContent } from './mail-templates';

/** Give up on an unresponsive mail server quickly: a person is waiting on the mutation. */
const SMTP_TIMEOUT_MS = 10_000;

/** Sends mail through the configured SMTP server (the local fake in development and tests). */
@Injectable()
export class MailService implements OnModuleDestroy {
  private readonly logger = new Logger('Mail');
  private readonly transport: Transporter;
  private readonly from: string;

  constructor(@Inject(APP_CONFIG) config: AppConfig) {
    const { host, port, secure, user, password, from } = config.smtp;
    this.from = from;
    this.transport = createTransport({
      host,
      port,
      secure,
      auth: user ? { user, pass: password ?? '' } : undefined,
      connectionTimeout: SMTP_TIMEOUT_MS,
      greetingTimeout: SMTP_TIMEOUT_MS,
      socketTimeout: SMTP_TIMEOUT_MS,
    });
  }

  /** Send one message; a failure becomes SERVICE_UNAVAILABLE naming the cause, never silence. */
  async send(to: string, content: MailContent): Promise<void> {
    try {
      await this.transport.sendMail({ from: this.from, to, subject: content.subject, text: content.text, html: content.html });
    } catch (error) {
      throw this.failure(error);
    }
  }

  /**
   * Check the mail server answers, without sending. Used where no mail goes out but the answer
   * must look the same as when one would (password reset for an unknown address).
   */
  async checkReachable(): Promise<void> {
    try {
      await this.transport.verify();
    } catch (error) {
      throw this.failure(error);
    }
  }

  onModuleDestroy(): void {
    this.transport.close();
  }

  private failure(error: unknown) {
    const reason = error instanceof Error ? error.message : String(error);
    this.logger.error(`mail not sent: ${reason}`);
    return unavailable(`the e-mail could not be sent (${reason}); nothing was saved, try again later`);
  }
}

import { Inject, Injectable } from '@nestjs/common';
import { notFound } from '../common/errors/domain-error';
import { AuthUser } from '../auth/auth-user';
import { APP_CONFIG, AppConfig } from '../config/config';
import { UserRow, UsersRepository } from './users.repository';

@Injectable()
export class UsersService {
  constructor(
    private readonly users: UsersRepository,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  async me(user: AuthUser): Promise<UserRow> {
    const row = await this.users.findById(user.id);
    if (!row) throw notFound('user');
    return row;
  }

  findById(id: string): Promise<UserRow | undefined> {
    return this.users.findById(id);
  }

  /** An operator of this server (`OPERATOR_EMAILS`): may install the calibration curves every project shares. */
  isOperator(row: UserRow): boolean {
    return this.config.operatorEmails.includes(row.email.toLowerCase());
  }

  /** The caller's row, when the caller is an operator. */
  async operator(user: AuthUser): Promise<UserRow | undefined> {
    const row = await this.users.findById(user.id);
    return row && this.isOperator(row) ? row : undefined;
  }
}

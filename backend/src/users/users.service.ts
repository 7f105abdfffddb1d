import { Injectable } from '@nestjs/common';
import { notFound } from '../common/errors/domain-error';
import { AuthUser } from '../auth/auth-user';
import { UserRow, UsersRepository } from './users.repository';

@Injectable()
export class UsersService {
  constructor(private readonly users: UsersRepository) {}

  async me(user: AuthUser): Promise<UserRow> {
    const row = await this.users.findById(user.id);
    if (!row) throw notFound('user');
    return row;
  }

  findById(id: string): Promise<UserRow | undefined> {
    return this.users.findById(id);
  }
}

import { Module } from '@nestjs/common';
import { UsersRepository } from './users.repository';
import { UsersResolver } from './users.resolver';
import { UsersService } from './users.service';

@Module({
  providers: [UsersRepository, UsersService, UsersResolver],
  exports: [UsersRepository, UsersService],
})
export class UsersModule {}

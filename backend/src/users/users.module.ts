import { Module } from '@nestjs/common';
import { MembershipsModule } from '../memberships/memberships.module';
import { UsersRepository } from './users.repository';
import { UsersResolver } from './users.resolver';
import { UsersService } from './users.service';

@Module({
  imports: [MembershipsModule],
  providers: [UsersRepository, UsersService, UsersResolver],
  exports: [UsersRepository, UsersService],
})
export class UsersModule {}

import { Module } from '@nestjs/common';
import { MembershipsModule } from '../memberships/memberships.module';
import { MembersRepository } from './members.repository';
import { MembersResolver } from './members.resolver';
import { MembersService } from './members.service';

@Module({
  imports: [MembershipsModule],
  providers: [MembersRepository, MembersService, MembersResolver],
})
export class MembersModule {}

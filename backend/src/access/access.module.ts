import { Global, Module } from '@nestjs/common';
import { AccessRepository } from './access.repository';
import { AccessService } from './access.service';

@Global()
@Module({ providers: [AccessRepository, AccessService], exports: [AccessService] })
export class AccessModule {}

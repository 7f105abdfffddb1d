import { Args, Query, Resolver } from '@nestjs/graphql';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { AuditConnection, AuditTrailService } from './audit-trail.service';
import { AuditTrailInput } from './dto/audit-trail.input';

@Resolver('AuditRecord')
export class AuditResolver {
  constructor(private readonly trail: AuditTrailService) {}

  @Query('auditTrail')
  auditTrail(@CurrentUser() user: AuthUser, @Args('input') input: AuditTrailInput): Promise<AuditConnection> {
    return this.trail.trail(user, input);
  }
}

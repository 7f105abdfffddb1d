import { IsIn, IsUUID } from 'class-validator';
import { Role, ROLES } from '../../access/permissions';

export class SetMemberRoleInput {
  @IsUUID()
  projectId: string;

  @IsUUID()
  userId: string;

  @IsIn(ROLES)
  role: Role;
}

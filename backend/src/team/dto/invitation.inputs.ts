import { IsEmail, IsIn, IsOptional, IsString, IsUUID, Length, MaxLength } from 'class-validator';
import { Role, ROLES } from '../../access/permissions';

export class InviteMemberInput {
  @IsUUID()
  projectId: string;

  @IsEmail()
  @MaxLength(320)
  email: string;

  @IsIn(ROLES)
  role: Role;
}

export class AcceptInvitationInput {
  @IsString()
  @Length(1, 200)
  token: string;

  // Length rules depend on whether the account exists, so the service checks them.
  @IsString()
  @MaxLength(200)
  password: string;

  @IsOptional()
  @IsString()
  @Length(1, 200)
  displayName?: string;
}

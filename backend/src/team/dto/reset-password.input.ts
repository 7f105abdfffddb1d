import { IsString, Length, MaxLength } from 'class-validator';

export class ResetPasswordInput {
  @IsString()
  @Length(1, 200)
  token: string;

  // The minimum length is checked by the service, with the same message as for invitations.
  @IsString()
  @MaxLength(200)
  password: string;
}

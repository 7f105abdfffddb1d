import { IsString, IsUUID, Length } from 'class-validator';

export class CreateReleaseInput {
  @IsUUID()
  projectId: string;

  /** What the release is for ("v3, submitted with the paper"). */
  @IsString()
  @Length(1, 2000)
  note: string;
}

import { IsOptional, IsString, IsUUID, Length } from 'class-validator';

export class CreateHypothesisInput {
  @IsUUID()
  projectId: string;

  @IsString()
  @Length(1, 200)
  name: string;

  @IsOptional()
  @IsString()
  @Length(0, 5000)
  description?: string | null;

  /** Copy every tie of this hypothesis (of the same project). */
  @IsOptional()
  @IsUUID()
  copyFromId?: string | null;
}

export class UpdateHypothesisInput {
  @IsOptional()
  @IsString()
  @Length(1, 200)
  name?: string;

  @IsOptional()
  @IsString()
  @Length(0, 5000)
  description?: string | null;
}

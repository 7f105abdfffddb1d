import { IsIn, IsOptional, IsString, Length } from 'class-validator';

export class CreateProjectInput {
  @IsString()
  @Length(1, 200)
  name: string;

  @IsOptional()
  @IsString()
  @Length(0, 5000)
  description?: string;

  @IsOptional()
  @IsIn(['SUBDUCTION_INTERFACE', 'CRUSTAL'])
  tectonicSetting?: 'SUBDUCTION_INTERFACE' | 'CRUSTAL';
}

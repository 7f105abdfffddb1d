import { IsIn, IsOptional, IsString, Length } from 'class-validator';
import { TECTONIC_SETTINGS, type TectonicSetting } from '../../database/schema/enums';

export class CreateProjectInput {
  @IsString()
  @Length(1, 200)
  name: string;

  @IsOptional()
  @IsString()
  @Length(0, 5000)
  description?: string;

  @IsOptional()
  @IsIn(TECTONIC_SETTINGS)
  tectonicSetting?: TectonicSetting;
}

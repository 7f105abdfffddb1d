import { IsString, IsUUID, MaxLength, MinLength } from 'class-validator';

/** 20,000 rows of 17 numeric cells fit well inside this; the request body cap is 25 MB. */
export const MAX_CORE_LOG_CHARACTERS = 8 * 1024 * 1024;

export class UploadCoreLogInput {
  @IsUUID()
  siteId: string;

  @IsString()
  @MinLength(1, { message: 'a core log needs a name' })
  @MaxLength(120, { message: 'a core log name is at most 120 characters' })
  name: string;

  @IsString()
  @MaxLength(MAX_CORE_LOG_CHARACTERS, { message: 'the log sheet is too large (at most 8 MB); resample it or split the core' })
  csv: string;
}

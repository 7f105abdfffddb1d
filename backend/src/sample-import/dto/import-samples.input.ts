import { IsBoolean, IsString, IsUUID, MaxLength } from 'class-validator';

/** The request body is capped at 25 MB (app.factory.ts); the sheet text may use nearly all of it. */
export const MAX_LAB_SHEET_CHARACTERS = 24 * 1024 * 1024;

export class ImportSamplesInput {
  @IsUUID()
  siteId: string;

  @IsString()
  @MaxLength(MAX_LAB_SHEET_CHARACTERS, { message: 'the lab sheet is too large; split it into sheets of at most 24 MB' })
  csv: string;

  @IsBoolean()
  commit: boolean;
}

import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsBoolean, IsIn, IsOptional, IsString, IsUUID, Length, MaxLength, ValidateNested } from 'class-validator';
import { LAB_SHEET_COLUMNS, LabSheetColumn } from '../lab-sheet';

/** The request body is capped at 25 MB (app.factory.ts); the sheet text may use nearly all of it. */
export const MAX_LAB_SHEET_CHARACTERS = 24 * 1024 * 1024;

/** Most header choices one request may carry (a sheet has far fewer columns). */
export const MAX_COLUMN_CHOICES = 200;

/** What one header of a sheet holds: a lab-sheet field, or null to ignore the column. */
export class LabSheetColumnChoiceInput {
  @IsString()
  @Length(1, 200, { message: 'a header must have 1 to 200 characters' })
  header: string;

  @IsOptional()
  @IsIn(LAB_SHEET_COLUMNS, { message: `field must be one of ${LAB_SHEET_COLUMNS.join(', ')}, or null to ignore the column` })
  field?: LabSheetColumn | null;
}

export class ImportSamplesInput {
  @IsUUID()
  siteId: string;

  @IsString()
  @MaxLength(MAX_LAB_SHEET_CHARACTERS, { message: 'the lab sheet is too large; split it into sheets of at most 24 MB' })
  csv: string;

  @IsBoolean()
  commit: boolean;

  @IsOptional()
  @IsArray()
  @ArrayMaxSize(MAX_COLUMN_CHOICES, { message: `at most ${MAX_COLUMN_CHOICES} column choices` })
  @ValidateNested({ each: true })
  @Type(() => LabSheetColumnChoiceInput)
  columnChoices?: LabSheetColumnChoiceInput[] | null;
}

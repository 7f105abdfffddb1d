import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsInt, IsNumber, IsOptional, IsUUID, Max, Min, ValidateNested } from 'class-validator';
import { CountingRuleInput } from './segment-event-table.input';

/** Most draws one analysis may ask for: 20,000 keeps a run within a minute or so on one core. */
export const MAX_DRAWS = 20_000;
export const DEFAULT_DRAWS = 2_000;
export const DEFAULT_WINDOWS_YEARS: readonly number[] = [30, 50, 100];

export class StartRecurrenceAnalysisInput {
  @IsOptional()
  @IsUUID()
  segmentId?: string | null;

  @IsOptional()
  @IsUUID()
  siteId?: string | null;

  @IsOptional()
  @IsUUID()
  hypothesisId?: string | null;

  /** Calendar year CE the forecast windows start from. */
  @IsOptional()
  @IsInt()
  @Min(-50_000)
  @Max(3_000)
  forecastStartYear?: number | null;

  @IsOptional()
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(10)
  @IsNumber({ allowNaN: false, allowInfinity: false }, { each: true })
  @Min(1, { each: true, message: 'forecast windows must be at least 1 year' })
  @Max(10_000, { each: true, message: 'forecast windows must be at most 10,000 years' })
  windowsYears?: number[] | null;

  @IsOptional()
  @IsInt()
  @Min(100, { message: 'draws must be at least 100 for the 95 % ranges to mean anything' })
  @Max(MAX_DRAWS, { message: `draws must be at most ${MAX_DRAWS}` })
  draws?: number | null;

  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(2_147_483_647)
  seed?: number | null;

  @IsOptional()
  @IsUUID()
  releaseId?: string | null;

  /** Which of the segment's events count (segment analyses only); default: every tied event, untied events out. */
  @IsOptional()
  @ValidateNested()
  @Type(() => CountingRuleInput)
  countingRule?: CountingRuleInput | null;
}

import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsBoolean, IsNumber, IsOptional, IsUUID, Max, Min, ValidateNested } from 'class-validator';
import { GRADE_COUNT } from '../../chronology/recurrence';

const FINITE = { allowNaN: false, allowInfinity: false };

/** Which of a segment's events count (chronology/recurrence/event-counting.ts); every field optional. */
export class CountingRuleInput {
  @IsOptional()
  @IsNumber(FINITE)
  @Min(0, { message: 'minimumSpanShare must be a share between 0 and 1' })
  @Max(1, { message: 'minimumSpanShare must be a share between 0 and 1' })
  minimumSpanShare?: number | null;

  @IsOptional()
  @IsBoolean()
  includeUntied?: boolean | null;

  @IsOptional()
  @IsArray()
  @ArrayMinSize(GRADE_COUNT, { message: `qualityWeights needs ${GRADE_COUNT} weights, for qualities 1 to 4` })
  @ArrayMaxSize(GRADE_COUNT, { message: `qualityWeights needs ${GRADE_COUNT} weights, for qualities 1 to 4` })
  @IsNumber(FINITE, { each: true })
  @Min(0, { each: true, message: 'every quality weight must be a probability between 0 and 1' })
  @Max(1, { each: true, message: 'every quality weight must be a probability between 0 and 1' })
  qualityWeights?: number[] | null;

  @IsOptional()
  @IsArray()
  @ArrayMinSize(GRADE_COUNT, { message: `confidenceWeights needs ${GRADE_COUNT} weights, for confidences 1 to 4` })
  @ArrayMaxSize(GRADE_COUNT, { message: `confidenceWeights needs ${GRADE_COUNT} weights, for confidences 1 to 4` })
  @IsNumber(FINITE, { each: true })
  @Min(0, { each: true, message: 'every confidence weight must be a probability between 0 and 1' })
  @Max(1, { each: true, message: 'every confidence weight must be a probability between 0 and 1' })
  confidenceWeights?: number[] | null;
}

export class SegmentEventTableInput {
  @IsUUID()
  segmentId: string;

  /** Default: the project's preferred hypothesis. */
  @IsOptional()
  @IsUUID()
  hypothesisId?: string | null;

  @IsOptional()
  @ValidateNested()
  @Type(() => CountingRuleInput)
  countingRule?: CountingRuleInput | null;
}

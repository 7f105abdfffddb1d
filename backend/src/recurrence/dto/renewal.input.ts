import { ArrayMaxSize, ArrayMinSize, IsArray, IsIn, IsNumber, IsOptional, Max, Min } from 'class-validator';
import { RENEWAL_MODELS, type RenewalModel } from '../../chronology/recurrence';

const FINITE = { allowNaN: false, allowInfinity: false };

export class RenewalProbabilityInput {
  @IsIn(RENEWAL_MODELS)
  model: RenewalModel;

  @IsNumber(FINITE)
  @Min(1e-6, { message: 'meanRecurrenceYears must be a positive number of years' })
  @Max(1e7)
  meanRecurrenceYears: number;

  /** Ignored for POISSON; checked against the model in the service. */
  @IsNumber(FINITE)
  aperiodicity: number;

  @IsNumber(FINITE)
  @Min(0, { message: 'elapsedYears must be zero or more years' })
  @Max(1e7)
  elapsedYears: number;

  @IsNumber(FINITE)
  @Min(0, { message: 'windowYears must be zero or more years' })
  @Max(1e7)
  windowYears: number;
}

export class FitRenewalInput {
  @IsIn(RENEWAL_MODELS)
  model: RenewalModel;

  @IsArray()
  @ArrayMinSize(2, { message: 'at least 2 closed intervals are needed to fit a renewal model' })
  @ArrayMaxSize(10_000)
  @IsNumber(FINITE, { each: true })
  @Min(1e-6, { each: true, message: 'every interval must be a positive number of years' })
  intervalsYears: number[];

  @IsOptional()
  @IsNumber(FINITE)
  @Min(0, { message: 'openIntervalYears must be zero or more years' })
  openIntervalYears?: number | null;
}

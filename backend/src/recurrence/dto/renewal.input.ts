import { ArrayMaxSize, ArrayMinSize, IsArray, IsIn, IsInt, IsNumber, IsOptional, Max, Min } from 'class-validator';
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

/** Most intervals, windows and the longest span a stateless forecast takes: its cost stays bounded. */
export const FORECAST_LIMITS = { intervals: 1_000, windows: 10, years: 1e6 } as const;

export class RenewalForecastInput {
  @IsIn(RENEWAL_MODELS)
  model: RenewalModel;

  @IsArray()
  @ArrayMinSize(2, { message: 'at least 2 closed intervals are needed for a forecast with parameter uncertainty' })
  @ArrayMaxSize(FORECAST_LIMITS.intervals, { message: `at most ${FORECAST_LIMITS.intervals} intervals` })
  @IsNumber(FINITE, { each: true })
  @Min(1e-3, { each: true, message: 'every interval must be a positive number of years' })
  @Max(FORECAST_LIMITS.years, { each: true, message: `every interval must be at most ${FORECAST_LIMITS.years} years` })
  intervalsYears: number[];

  @IsNumber(FINITE)
  @Min(0, { message: 'openIntervalYears must be zero or more years' })
  @Max(FORECAST_LIMITS.years, { message: `openIntervalYears must be at most ${FORECAST_LIMITS.years} years` })
  openIntervalYears: number;

  @IsArray()
  @ArrayMinSize(1, { message: 'give at least one forecast window' })
  @ArrayMaxSize(FORECAST_LIMITS.windows, { message: `at most ${FORECAST_LIMITS.windows} windows` })
  @IsNumber(FINITE, { each: true })
  @Min(1e-3, { each: true, message: 'every window must be a positive number of years' })
  @Max(FORECAST_LIMITS.years, { each: true, message: `every window must be at most ${FORECAST_LIMITS.years} years` })
  windowsYears: number[];

  @IsOptional()
  @IsInt()
  seed?: number | null;
}

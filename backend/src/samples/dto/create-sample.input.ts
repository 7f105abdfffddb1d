import { OmitType, PartialType } from '@nestjs/mapped-types';
import { IsBoolean, IsIn, IsInt, IsNumber, IsOptional, IsPositive, IsString, IsUUID, Length, Matches, Max, Min } from 'class-validator';
import { MAX_AGE_ERROR_YEARS, MAX_AGE_YEARS } from '../../chronology/calibration/bounds';
import { CURVE_CODES, CurveCode } from '../../calibration/dto/calibrate.input';
import { AGE_RELATIONS, DATING_METHODS, INHERITANCE_SCALE_LIMITS, SAMPLE_MATERIALS } from '../sample-rules';

export { AGE_RELATIONS, DATING_METHODS, SAMPLE_MATERIALS };

const finite = { allowNaN: false, allowInfinity: false };

/**
 * Types and ranges are checked here; which fields each method requires (and whether the values
 * can be calibrated at all) is checked by the calibration engine, so a form, an update and an
 * import line get the same messages.
 */
export class CreateSampleInput {
  @IsUUID()
  siteId: string;

  @IsUUID()
  unitId: string;

  @IsString()
  @Length(1, 64)
  @Matches(/^[\w.\-/ ]+$/, { message: 'labCode may hold letters, digits, spaces and . - _ / only' })
  labCode: string;

  @IsIn(DATING_METHODS)
  method: (typeof DATING_METHODS)[number];

  @IsIn(SAMPLE_MATERIALS)
  material: (typeof SAMPLE_MATERIALS)[number];

  @IsOptional()
  @IsNumber(finite)
  @Min(0, { message: 'depthM cannot be negative' })
  @Max(10000)
  depthM?: number | null;

  @IsIn(AGE_RELATIONS)
  ageRelation: (typeof AGE_RELATIONS)[number];

  @IsOptional()
  @IsNumber(finite)
  @Min(0, { message: 'c14Age cannot be negative: a post-bomb (modern) sample cannot be calibrated on these curves' })
  @Max(MAX_AGE_YEARS)
  c14Age?: number | null;

  @IsOptional()
  @IsNumber(finite)
  @IsPositive({ message: 'c14Error must be greater than 0 (the 1-sigma error in 14C years)' })
  @Max(MAX_AGE_ERROR_YEARS, { message: `c14Error must not be greater than ${MAX_AGE_ERROR_YEARS} (14C years)` })
  c14Error?: number | null;

  @IsOptional()
  @IsNumber(finite)
  @Min(-60)
  @Max(20)
  delta13C?: number | null;

  @IsOptional()
  @IsIn(CURVE_CODES)
  curve?: CurveCode | null;

  @IsOptional()
  @IsNumber(finite)
  @Min(-2000)
  @Max(5000)
  deltaR?: number | null;

  @IsOptional()
  @IsNumber(finite)
  @Min(0, { message: 'deltaRError cannot be negative' })
  @Max(MAX_AGE_ERROR_YEARS, { message: `deltaRError must not be greater than ${MAX_AGE_ERROR_YEARS} (14C years)` })
  deltaRError?: number | null;

  @IsOptional()
  @IsString()
  @Length(0, 100, { message: 'deltaRSource may hold at most 100 characters' })
  deltaRSource?: string | null;

  @IsOptional()
  @IsNumber(finite)
  @Min(INHERITANCE_SCALE_LIMITS.min, { message: `inheritanceScaleYears must be at least ${INHERITANCE_SCALE_LIMITS.min} year` })
  @Max(INHERITANCE_SCALE_LIMITS.max, { message: `inheritanceScaleYears must not be greater than ${INHERITANCE_SCALE_LIMITS.max} years` })
  inheritanceScaleYears?: number | null;

  @IsOptional()
  @IsNumber(finite)
  @Min(-MAX_AGE_YEARS)
  @Max(MAX_AGE_YEARS)
  calendarAgeBp?: number | null;

  @IsOptional()
  @IsNumber(finite)
  @IsPositive({ message: 'calendarErrorYears must be greater than 0' })
  @Max(MAX_AGE_ERROR_YEARS, { message: `calendarErrorYears must not be greater than ${MAX_AGE_ERROR_YEARS} years` })
  calendarErrorYears?: number | null;

  @IsOptional()
  @IsInt()
  measurementYear?: number | null;

  @IsOptional()
  @IsBoolean()
  excluded?: boolean;

  @IsOptional()
  @IsString()
  @Length(0, 1000)
  exclusionReason?: string | null;

  @IsOptional()
  @IsString()
  @Length(0, 5000)
  notes?: string | null;
}

export class UpdateSampleInput extends PartialType(OmitType(CreateSampleInput, ['siteId'] as const)) {}

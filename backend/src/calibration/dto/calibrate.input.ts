import { IsBoolean, IsIn, IsInt, IsNumber, IsOptional, IsString, Length, Max, MaxLength, Min } from 'class-validator';
import { MAX_AGE_ERROR_YEARS, MAX_AGE_YEARS } from '../../chronology/calibration/bounds';

export const CURVE_CODES = ['INTCAL20', 'MARINE20', 'SHCAL20'] as const;
export type CurveCode = (typeof CURVE_CODES)[number];

const finite = { allowNaN: false, allowInfinity: false };

/** Range checks here bound the work of one request (chronology/calibration/bounds.ts); the engine gives the researcher-facing messages. */
export class CalibrateInput {
  @IsNumber(finite)
  @Min(-MAX_AGE_YEARS)
  @Max(MAX_AGE_YEARS)
  c14Age: number;

  @IsNumber(finite)
  @Max(MAX_AGE_ERROR_YEARS, { message: `c14Error must not be greater than ${MAX_AGE_ERROR_YEARS} (14C years)` })
  c14Error: number;

  @IsIn(CURVE_CODES)
  curve: CurveCode;

  @IsOptional()
  @IsNumber(finite)
  @Min(-MAX_AGE_YEARS)
  @Max(MAX_AGE_YEARS)
  deltaR?: number | null;

  @IsOptional()
  @IsNumber(finite)
  @Max(MAX_AGE_ERROR_YEARS, { message: `deltaRError must not be greater than ${MAX_AGE_ERROR_YEARS} (14C years)` })
  deltaRError?: number | null;

  @IsOptional()
  @IsNumber(finite)
  @Min(-90)
  @Max(90)
  latitude?: number | null;
}

export class CalibrateLuminescenceInput {
  @IsNumber(finite)
  @Max(MAX_AGE_YEARS)
  ageYears: number;

  @IsNumber(finite)
  @Max(MAX_AGE_ERROR_YEARS, { message: `errorYears must not be greater than ${MAX_AGE_ERROR_YEARS} years` })
  errorYears: number;

  @IsInt()
  measurementYear: number;
}

export class InstallCurveInput {
  @IsIn(CURVE_CODES)
  code: CurveCode;

  @IsString()
  @Length(1, 200)
  name: string;

  @IsBoolean()
  marine: boolean;

  /** A published curve file is about 0.5 MB; allow headroom. */
  @IsString()
  @MaxLength(5_000_000)
  text: string;
}

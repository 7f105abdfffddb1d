import { IsBoolean, IsIn, IsInt, IsNumber, IsOptional, IsString, Length, Max, MaxLength, Min } from 'class-validator';

export const CURVE_CODES = ['INTCAL20', 'MARINE20', 'SHCAL20'] as const;
export type CurveCode = (typeof CURVE_CODES)[number];

const finite = { allowNaN: false, allowInfinity: false };

/** Range checks here are only for sanity; the engine gives the researcher-facing messages. */
export class CalibrateInput {
  @IsNumber(finite)
  c14Age: number;

  @IsNumber(finite)
  c14Error: number;

  @IsIn(CURVE_CODES)
  curve: CurveCode;

  @IsOptional()
  @IsNumber(finite)
  deltaR?: number | null;

  @IsOptional()
  @IsNumber(finite)
  deltaRError?: number | null;

  @IsOptional()
  @IsNumber(finite)
  @Min(-90)
  @Max(90)
  latitude?: number | null;
}

export class CalibrateLuminescenceInput {
  @IsNumber(finite)
  ageYears: number;

  @IsNumber(finite)
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

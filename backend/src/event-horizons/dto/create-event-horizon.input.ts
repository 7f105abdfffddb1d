import { OmitType, PartialType } from '@nestjs/mapped-types';
import { ArrayMaxSize, IsArray, IsInt, IsNumber, IsOptional, IsPositive, IsString, IsUUID, Length, Max, Min } from 'class-validator';

const FINITE = { allowNaN: false, allowInfinity: false };

export class CreateEventHorizonInput {
  @IsUUID()
  siteId: string;

  @IsString()
  @Length(1, 200)
  name: string;

  @IsUUID()
  unitBelowId: string;

  @IsUUID()
  unitAboveId: string;

  /** 1 (certain) to 4 (possible). */
  @IsInt()
  @Min(1)
  @Max(4)
  quality: number;

  @IsOptional()
  @IsArray()
  @ArrayMaxSize(20)
  @IsString({ each: true })
  @Length(1, 100, { each: true })
  evidence?: string[];

  @IsOptional()
  @IsString()
  @Length(0, 5000)
  notes?: string | null;

  /** Measured coseismic subsidence, m (negative for uplift); null clears it. */
  @IsOptional()
  @IsNumber(FINITE)
  @Min(-100)
  @Max(100)
  subsidenceM?: number | null;

  /** 1-sigma error of the subsidence, m; must be > 0. */
  @IsOptional()
  @IsNumber(FINITE)
  @IsPositive({ message: 'subsidenceErrorM must be greater than 0' })
  @Max(100)
  subsidenceErrorM?: number | null;

  /** Measured coseismic displacement (slip), m; null clears it. */
  @IsOptional()
  @IsNumber(FINITE)
  @Min(0, { message: 'displacementM must be zero or more metres' })
  @Max(200)
  displacementM?: number | null;

  /** 1-sigma error of the displacement, m; must be > 0. */
  @IsOptional()
  @IsNumber(FINITE)
  @IsPositive({ message: 'displacementErrorM must be greater than 0' })
  @Max(200)
  displacementErrorM?: number | null;
}

export class UpdateEventHorizonInput extends PartialType(OmitType(CreateEventHorizonInput, ['siteId'] as const)) {}

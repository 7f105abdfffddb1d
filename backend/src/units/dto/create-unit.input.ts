import { OmitType, PartialType } from '@nestjs/mapped-types';
import { IsBoolean, IsIn, IsInt, IsNumber, IsOptional, IsString, IsUUID, Length, Max, Min } from 'class-validator';

import { FACIES, type Facies } from '../../database/schema/enums';

export { FACIES, type Facies };

const finite = { allowNaN: false, allowInfinity: false };

export class CreateUnitInput {
  @IsUUID()
  siteId: string;

  @IsInt()
  @Min(1)
  @Max(10000)
  position: number;

  /** Insert mid-column: the unit at `position` and every younger one move up one position. */
  @IsOptional()
  @IsBoolean()
  makeRoom?: boolean | null;

  @IsString()
  @Length(1, 200)
  name: string;

  @IsNumber(finite)
  @Min(0)
  @Max(10000)
  topDepthM: number;

  @IsNumber(finite)
  @Min(0)
  @Max(10000)
  baseDepthM: number;

  @IsIn(FACIES)
  facies: Facies;

  /** Estimated thickness of mud the unit's base eroded (m); null clears it. */
  @IsOptional()
  @IsNumber(finite)
  @Min(0, { message: 'basalErosionM must be at least 0 (a thickness of eroded mud, m)' })
  @Max(100)
  basalErosionM?: number | null;

  @IsOptional()
  @IsString()
  @Length(0, 5000)
  notes?: string | null;
}

export class UpdateUnitInput extends PartialType(OmitType(CreateUnitInput, ['siteId', 'makeRoom'] as const)) {}

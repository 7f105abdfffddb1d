import { OmitType, PartialType } from '@nestjs/mapped-types';
import { IsIn, IsNumber, IsOptional, IsString, IsUUID, Length, Max, Min } from 'class-validator';

import { SITE_KINDS, type SiteKind } from '../../database/schema/enums';

export { SITE_KINDS, type SiteKind };

const finite = { allowNaN: false, allowInfinity: false };

export class CreateSiteInput {
  @IsUUID()
  projectId: string;

  @IsOptional()
  @IsUUID()
  segmentId?: string | null;

  @IsString()
  @Length(1, 200)
  name: string;

  @IsIn(SITE_KINDS)
  kind: SiteKind;

  @IsNumber(finite)
  @Min(-90)
  @Max(90)
  latitude: number;

  @IsNumber(finite)
  @Min(-180)
  @Max(180)
  longitude: number;

  @IsNumber(finite)
  @Min(-20000)
  @Max(20000)
  alongStrikeKm: number;

  @IsOptional()
  @IsNumber(finite)
  @Min(-500)
  @Max(9000)
  elevationM?: number | null;

  @IsOptional()
  @IsNumber(finite)
  @Min(0)
  @Max(11000)
  waterDepthM?: number | null;

  @IsOptional()
  @IsString()
  @Length(0, 5000)
  notes?: string | null;
}

export class UpdateSiteInput extends PartialType(OmitType(CreateSiteInput, ['projectId'] as const)) {}

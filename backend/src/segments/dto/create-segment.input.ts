import { PartialType, OmitType } from '@nestjs/mapped-types';
import { IsNumber, IsOptional, IsPositive, IsString, IsUUID, Length, Max, Min } from 'class-validator';

export class CreateSegmentInput {
  @IsUUID()
  projectId: string;

  @IsString()
  @Length(1, 200)
  name: string;

  @IsNumber({ allowNaN: false, allowInfinity: false })
  @Min(-20000)
  @Max(20000)
  startKm: number;

  @IsNumber({ allowNaN: false, allowInfinity: false })
  @Min(-20000)
  @Max(20000)
  endKm: number;

  @IsOptional()
  @IsString()
  @Length(0, 5000)
  notes?: string;

  /** Down-dip width of the rupture plane, km (for Mw from rupture area); null clears it. */
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @IsPositive({ message: 'downDipWidthKm must be a positive number of kilometres' })
  @Max(1000, { message: 'downDipWidthKm must be at most 1,000 km' })
  downDipWidthKm?: number | null;
}

export class UpdateSegmentInput extends PartialType(OmitType(CreateSegmentInput, ['projectId'] as const)) {}

import { PartialType, OmitType } from '@nestjs/mapped-types';
import { IsNumber, IsOptional, IsString, IsUUID, Length, Max, Min } from 'class-validator';

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
}

export class UpdateSegmentInput extends PartialType(OmitType(CreateSegmentInput, ['projectId'] as const)) {}

import { OmitType, PartialType } from '@nestjs/mapped-types';
import { ArrayMaxSize, IsArray, IsInt, IsOptional, IsString, IsUUID, Length, Max, Min } from 'class-validator';

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
}

export class UpdateEventHorizonInput extends PartialType(OmitType(CreateEventHorizonInput, ['siteId'] as const)) {}

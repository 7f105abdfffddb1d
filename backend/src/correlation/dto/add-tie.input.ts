import { ArrayMaxSize, IsArray, IsInt, IsOptional, IsString, IsUUID, Length, Max, Min } from 'class-validator';

export class AddTieInput {
  @IsUUID()
  hypothesisId: string;

  /** Event horizon ids. */
  @IsUUID()
  eventAId: string;

  @IsUUID()
  eventBId: string;

  /** 1 (certain) to 4 (possible). */
  @IsInt()
  @Min(1)
  @Max(4)
  confidence: number;

  /** Age overlap, order, log match, count of events between, ... */
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(20)
  @IsString({ each: true })
  @Length(1, 100, { each: true })
  evidence?: string[];

  @IsOptional()
  @IsString()
  @Length(0, 5000)
  note?: string | null;
}

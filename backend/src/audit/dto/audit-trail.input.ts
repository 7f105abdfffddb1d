import { Type } from 'class-transformer';
import { IsDate, IsInt, IsOptional, IsString, IsUUID, Length, Max, Min } from 'class-validator';

export const AUDIT_PAGE_DEFAULT = 50;
export const AUDIT_PAGE_MAX = 200;

export class AuditTrailInput {
  @IsUUID()
  projectId: string;

  @IsOptional()
  @IsInt()
  @Min(1)
  @Max(AUDIT_PAGE_MAX)
  first?: number;

  @IsOptional()
  @IsString()
  @Length(1, 100)
  after?: string;

  @IsOptional()
  @IsUUID()
  actorId?: string;

  @IsOptional()
  @IsString()
  @Length(1, 100)
  objectType?: string;

  @IsOptional()
  @IsString()
  @Length(1, 200)
  objectId?: string;

  @IsOptional()
  @Type(() => Date)
  @IsDate()
  from?: Date;

  @IsOptional()
  @Type(() => Date)
  @IsDate()
  to?: Date;
}

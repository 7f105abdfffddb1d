import { IsOptional, IsString, IsUUID, Length } from 'class-validator';

/** Query string of an upload: exactly one of siteId, unitId, sampleId, and the file's name. */
export class UploadAttachmentQuery {
  @IsOptional()
  @IsUUID()
  siteId?: string;

  @IsOptional()
  @IsUUID()
  unitId?: string;

  @IsOptional()
  @IsUUID()
  sampleId?: string;

  @IsString()
  @Length(1, 255)
  fileName: string;
}

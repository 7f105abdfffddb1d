import { IsOptional, IsUUID } from 'class-validator';

export class ChooseDownstreamRunInput {
  @IsUUID()
  siteId: string;

  /** A SUCCEEDED run of the site; null or absent: follow the site's newest successful run. */
  @IsOptional()
  @IsUUID()
  runId?: string | null;
}

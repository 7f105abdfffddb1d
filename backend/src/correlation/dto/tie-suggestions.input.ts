import { IsUUID } from 'class-validator';

export class TieSuggestionsInput {
  @IsUUID()
  hypothesisId: string;

  @IsUUID()
  siteAId: string;

  @IsUUID()
  siteBId: string;
}

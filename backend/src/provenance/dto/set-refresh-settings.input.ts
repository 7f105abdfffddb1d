import { IsBoolean, IsInt, IsOptional, IsUUID, Max, Min } from 'class-validator';

export class SetRefreshSettingsInput {
  @IsUUID()
  projectId: string;

  @IsBoolean()
  automatic: boolean;

  @IsOptional()
  @IsInt()
  @Min(10, { message: 'debounceSeconds must be at least 10' })
  @Max(3600, { message: 'debounceSeconds must be at most 3600' })
  debounceSeconds?: number | null;
}

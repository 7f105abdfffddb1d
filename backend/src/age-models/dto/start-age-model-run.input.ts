import { IsIn, IsInt, IsNumber, IsOptional, IsUUID, Max, Min } from 'class-validator';

export const DEPTH_MODELS = ['ORDER_ONLY', 'HEMIPELAGIC_RATE'] as const;
export type DepthModel = (typeof DEPTH_MODELS)[number];

export class StartAgeModelRunInput {
  @IsUUID()
  siteId: string;

  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(2_147_483_647)
  seed?: number;

  /** Sweeps per chain after burn-in. */
  @IsOptional()
  @IsInt()
  @Min(500)
  @Max(500_000)
  iterations?: number;

  @IsOptional()
  @IsInt()
  @Min(4, { message: 'chains must be at least 4 so that R-hat can compare them' })
  @Max(16)
  chains?: number;

  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @Min(0.001)
  @Max(0.5)
  outlierPrior?: number;

  /** Mean absolute shift (years) of an outlying sample's unknown offset; default 500. */
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @Min(10)
  @Max(10_000)
  outlierShiftScaleYears?: number;

  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @Min(1)
  @Max(5000)
  inheritanceScaleYears?: number;

  @IsOptional()
  @IsIn(DEPTH_MODELS)
  depthModel?: DepthModel;

  /** Prior mean hemipelagic accumulation rate (cm per thousand years); measured from the dated levels when absent. */
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @Min(0.1)
  @Max(1000)
  hemipelagicRateCmPerKyr?: number;
}

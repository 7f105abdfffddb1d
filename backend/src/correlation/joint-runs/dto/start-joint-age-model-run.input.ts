import { IsInt, IsOptional, IsUUID, Max, Min } from 'class-validator';
import { JOINT_RUN_LIMITS } from '../joint-run-settings';

export class StartJointAgeModelRunInput {
  @IsUUID()
  hypothesisId: string;

  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(2_147_483_647)
  seed?: number;

  /** Chains, each a job of its own. */
  @IsOptional()
  @IsInt()
  @Min(JOINT_RUN_LIMITS.chains.min, { message: `chains must be at least ${JOINT_RUN_LIMITS.chains.min} so that R-hat can compare them` })
  @Max(JOINT_RUN_LIMITS.chains.max, { message: `chains must be at most ${JOINT_RUN_LIMITS.chains.max}` })
  chains?: number;

  /** Sweeps per chain after burn-in. */
  @IsOptional()
  @IsInt()
  @Min(JOINT_RUN_LIMITS.iterations.min, { message: `iterations must be at least ${JOINT_RUN_LIMITS.iterations.min}` })
  @Max(JOINT_RUN_LIMITS.iterations.max, { message: `iterations must be at most ${JOINT_RUN_LIMITS.iterations.max}` })
  iterations?: number;
}

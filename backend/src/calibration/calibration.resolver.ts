import { Args, Int, Mutation, Parent, Query, ResolveField, Resolver } from '@nestjs/graphql';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { DensityGrid } from '../chronology/common/density-views';
import { CalibrationService, CalibrationView, densityGridOf, densityPoints } from './calibration.service';
import { CurveInfo } from './curve-registry.service';
import { CalibrateInput, CalibrateLuminescenceInput, CurveCode, InstallCurveInput } from './dto/calibrate.input';

@Resolver('Calibration')
export class CalibrationResolver {
  constructor(private readonly calibration: CalibrationService) {}

  @Query('calibrate')
  calibrate(@Args('input') input: CalibrateInput): Promise<CalibrationView> {
    return this.calibration.calibrate(input);
  }

  @Query('calibrateLuminescence')
  calibrateLuminescence(@Args('input') input: CalibrateLuminescenceInput): CalibrationView {
    return this.calibration.calibrateLuminescence(input);
  }

  @Query('calibrationCurves')
  curves(): Promise<CurveInfo[]> {
    return this.calibration.listCurves();
  }

  @Query('calibrationCurveBand')
  curveBand(
    @Args('curve') curve: CurveCode,
    @Args('youngerCalBp', { type: () => Int }) youngerCalBp: number,
    @Args('olderCalBp', { type: () => Int }) olderCalBp: number,
  ) {
    return this.calibration.curveBand(curve, youngerCalBp, olderCalBp);
  }

  /** Made only when asked (a sample's density is recomputed from its dating). */
  @ResolveField('density')
  async density(@Parent() calibration: CalibrationView): Promise<{ calBp: number; probability: number }[]> {
    return densityPoints(await calibration.calendarDensity());
  }

  @ResolveField('densityGrid')
  async densityGrid(@Parent() calibration: CalibrationView): Promise<DensityGrid> {
    return densityGridOf(await calibration.calendarDensity());
  }

  @Mutation('installCalibrationCurve')
  install(@CurrentUser() user: AuthUser, @Args('input') input: InstallCurveInput): Promise<CurveInfo> {
    return this.calibration.installCurve(user, input);
  }
}

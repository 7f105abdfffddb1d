import { DEFAULT_INHERITANCE_SCALE_YEARS } from './sample-rules';
import { Args, Int, Mutation, Parent, Query, ResolveField, Resolver } from '@nestjs/graphql';
import { AuthUser } from '../auth/auth-user';
import { CalibrationService, CalibrationView } from '../calibration/calibration.service';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { SiteRow } from '../sites/sites.repository';
import { SitesService } from '../sites/sites.service';
import { UnitRow } from '../units/units.repository';
import { UnitsService } from '../units/units.service';
import { CreateSampleInput, UpdateSampleInput } from './dto/create-sample.input';
import { SampleRow } from './samples.repository';
import { SamplesService } from './samples.service';

@Resolver('Sample')
export class SamplesResolver {
  constructor(
    private readonly samples: SamplesService,
    private readonly units: UnitsService,
    private readonly sites: SitesService,
    private readonly calibrations: CalibrationService,
  ) {}

  @Query('sample')
  get(@CurrentUser() user: AuthUser, @Args('id') id: string): Promise<SampleRow> {
    return this.samples.get(user, id);
  }

  @Mutation('createSample')
  create(@CurrentUser() user: AuthUser, @Args('input') input: CreateSampleInput): Promise<SampleRow> {
    return this.samples.create(user, input);
  }

  @Mutation('updateSample')
  update(
    @CurrentUser() user: AuthUser,
    @Args('id') id: string,
    @Args('version', { type: () => Int }) version: number,
    @Args('input') input: UpdateSampleInput,
  ): Promise<SampleRow> {
    return this.samples.update(user, id, version, input);
  }

  @Mutation('deleteSample')
  delete(@CurrentUser() user: AuthUser, @Args('id') id: string): Promise<boolean> {
    return this.samples.delete(user, id);
  }

  @ResolveField('calibration')
  calibration(@Parent() sample: SampleRow): CalibrationView | null {
    return sample.calibration ? this.calibrations.viewOfSample(sample.calibration, sample) : null;
  }

  @ResolveField('inheritanceScaleDefaultYears')
  inheritanceScaleDefaultYears(@Parent() sample: SampleRow): number {
    return DEFAULT_INHERITANCE_SCALE_YEARS[sample.material];
  }

  @ResolveField('unit')
  unit(@Parent() sample: SampleRow): Promise<UnitRow | undefined> {
    return this.units.findById(sample.unitId);
  }

  @ResolveField('site')
  site(@Parent() sample: SampleRow): Promise<SiteRow | undefined> {
    return this.sites.findById(sample.siteId);
  }
}

/** `Site.samples`. */
@Resolver('Site')
export class SiteSamplesResolver {
  constructor(private readonly samples: SamplesService) {}

  @ResolveField('samples')
  samplesOf(@Parent() site: SiteRow): Promise<SampleRow[]> {
    return this.samples.listForSite(site.id);
  }
}

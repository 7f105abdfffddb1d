import { Args, Int, Mutation, Parent, ResolveField, Resolver } from '@nestjs/graphql';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { SiteRow } from '../sites/sites.repository';
import { SitesService } from '../sites/sites.service';
import { CreateUnitInput, UpdateUnitInput } from './dto/create-unit.input';
import { UnitRow } from './units.repository';
import { UnitsService } from './units.service';

@Resolver('Unit')
export class UnitsResolver {
  constructor(
    private readonly units: UnitsService,
    private readonly sites: SitesService,
  ) {}

  @Mutation('createUnit')
  create(@CurrentUser() user: AuthUser, @Args('input') input: CreateUnitInput): Promise<UnitRow> {
    return this.units.create(user, input);
  }

  @Mutation('updateUnit')
  update(
    @CurrentUser() user: AuthUser,
    @Args('id') id: string,
    @Args('version', { type: () => Int }) version: number,
    @Args('input') input: UpdateUnitInput,
  ): Promise<UnitRow> {
    return this.units.update(user, id, version, input);
  }

  @Mutation('deleteUnit')
  delete(@CurrentUser() user: AuthUser, @Args('id') id: string): Promise<boolean> {
    return this.units.delete(user, id);
  }

  @ResolveField('site')
  async site(@Parent() unit: UnitRow): Promise<SiteRow | undefined> {
    return this.sites.findById(unit.siteId);
  }
}

/** `Site.units`, oldest first. */
@Resolver('Site')
export class SiteUnitsResolver {
  constructor(private readonly units: UnitsService) {}

  @ResolveField('units')
  unitsOf(@Parent() site: SiteRow): Promise<UnitRow[]> {
    return this.units.listForSite(site.id);
  }
}

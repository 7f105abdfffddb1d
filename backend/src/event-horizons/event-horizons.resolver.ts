import { Args, Int, Mutation, Parent, ResolveField, Resolver } from '@nestjs/graphql';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { SiteRow } from '../sites/sites.repository';
import { SitesService } from '../sites/sites.service';
import { UnitRow } from '../units/units.repository';
import { UnitsService } from '../units/units.service';
import { CreateEventHorizonInput, UpdateEventHorizonInput } from './dto/create-event-horizon.input';
import { EventHorizonRow } from './event-horizons.repository';
import { EventHorizonsService } from './event-horizons.service';

@Resolver('EventHorizon')
export class EventHorizonsResolver {
  constructor(
    private readonly eventHorizons: EventHorizonsService,
    private readonly units: UnitsService,
    private readonly sites: SitesService,
  ) {}

  @Mutation('createEventHorizon')
  create(@CurrentUser() user: AuthUser, @Args('input') input: CreateEventHorizonInput): Promise<EventHorizonRow> {
    return this.eventHorizons.create(user, input);
  }

  @Mutation('updateEventHorizon')
  update(
    @CurrentUser() user: AuthUser,
    @Args('id') id: string,
    @Args('version', { type: () => Int }) version: number,
    @Args('input') input: UpdateEventHorizonInput,
  ): Promise<EventHorizonRow> {
    return this.eventHorizons.update(user, id, version, input);
  }

  @Mutation('deleteEventHorizon')
  delete(@CurrentUser() user: AuthUser, @Args('id') id: string): Promise<boolean> {
    return this.eventHorizons.delete(user, id);
  }

  @ResolveField('unitBelow')
  unitBelow(@Parent() horizon: EventHorizonRow): Promise<UnitRow | undefined> {
    return this.units.findById(horizon.unitBelowId);
  }

  @ResolveField('unitAbove')
  unitAbove(@Parent() horizon: EventHorizonRow): Promise<UnitRow | undefined> {
    return this.units.findById(horizon.unitAboveId);
  }

  @ResolveField('site')
  site(@Parent() horizon: EventHorizonRow): Promise<SiteRow | undefined> {
    return this.sites.findById(horizon.siteId);
  }
}

/** `Site.eventHorizons`, oldest first. */
@Resolver('Site')
export class SiteEventHorizonsResolver {
  constructor(private readonly eventHorizons: EventHorizonsService) {}

  @ResolveField('eventHorizons')
  eventHorizonsOf(@Parent() site: SiteRow): Promise<EventHorizonRow[]> {
    return this.eventHorizons.listForSite(site.id);
  }
}

import { Parent, ResolveField, Resolver } from '@nestjs/graphql';
import type { RegionalEventView } from '../correlation/hypotheses.service';
import type { EventHorizonRow } from '../event-horizons/event-horizons.repository';
import { SegmentsRepository } from '../segments/segments.repository';
import { SiteRow, SitesRepository } from '../sites/sites.repository';
import { UnitsRepository } from '../units/units.repository';
import { areaMagnitude, bedThicknessM, displacementMagnitude } from './size-evidence';

/** `EventHorizon.bedThicknessM`; the horizon itself was already authorised. */
@Resolver('EventHorizon')
export class EventHorizonSizeResolver {
  constructor(
    private readonly sites: SitesRepository,
    private readonly units: UnitsRepository,
  ) {}

  @ResolveField('bedThicknessM')
  async bedThicknessM(@Parent() horizon: EventHorizonRow): Promise<number | null> {
    const site = await this.sites.findById(horizon.siteId);
    if (site?.kind !== 'CORE') return null;
    return bedThicknessM(site.kind, await this.units.findById(horizon.unitAboveId));
  }
}

/** Size fields of `RegionalEvent`; the hypothesis was already authorised. */
@Resolver('RegionalEvent')
export class RegionalEventSizeResolver {
  constructor(
    private readonly sites: SitesRepository,
    private readonly segments: SegmentsRepository,
    private readonly units: UnitsRepository,
  ) {}

  @ResolveField('magnitudeFromArea')
  async magnitudeFromArea(@Parent() event: RegionalEventView) {
    const sites = await this.sitesOf(event.members);
    const segmentIds = [...new Set(sites.map((site) => site.segmentId).filter((id): id is string => id !== null))];
    const segments = await Promise.all(segmentIds.map((id) => this.segments.findById(id)));
    return areaMagnitude(event.ruptureLengthKm, segments.map((segment) => segment?.downDipWidthKm ?? null));
  }

  @ResolveField('magnitudeFromDisplacement')
  magnitudeFromDisplacement(@Parent() event: RegionalEventView) {
    return displacementMagnitude(event.members);
  }

  @ResolveField('sizeProfile')
  async sizeProfile(@Parent() event: RegionalEventView) {
    const sites = new Map((await this.sitesOf(event.members)).map((site) => [site.id, site]));
    const points = await Promise.all(
      event.members.map(async (member) => {
        const site = sites.get(member.siteId) as SiteRow;
        const thickness = site.kind === 'CORE' ? bedThicknessM(site.kind, await this.units.findById(member.unitAboveId)) : null;
        return {
          eventHorizon: member,
          site,
          alongStrikeKm: site.alongStrikeKm,
          subsidenceM: member.subsidenceM,
          subsidenceErrorM: member.subsidenceErrorM,
          displacementM: member.displacementM,
          displacementErrorM: member.displacementErrorM,
          bedThicknessM: thickness,
        };
      }),
    );
    return points.sort((a, b) => (a.alongStrikeKm ?? Infinity) - (b.alongStrikeKm ?? Infinity));
  }

  private async sitesOf(members: readonly EventHorizonRow[]): Promise<SiteRow[]> {
    const ids = [...new Set(members.map((member) => member.siteId))];
    const rows = await Promise.all(ids.map((id) => this.sites.findById(id)));
    return rows.filter((row): row is SiteRow => row !== undefined);
  }
}

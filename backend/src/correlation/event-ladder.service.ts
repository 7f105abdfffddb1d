import { Injectable } from '@nestjs/common';
import { AccessService } from '../access/access.service';
import { Permission } from '../access/permissions';
import type { AgeModelRunRow } from '../age-models/age-model-runs.repository';
import { AuthUser } from '../auth/auth-user';
import type { HpdRange } from '../chronology/common/density';
import { notFound } from '../common/errors/domain-error';
import type { EventHorizonRow } from '../event-horizons/event-horizons.repository';
import { ProjectRow, ProjectsRepository } from '../projects/projects.repository';
import type { SiteRow } from '../sites/sites.repository';
import type { DensityGrid } from '../chronology/common/density-views';
import { CorrelationDataService, posteriorOf } from './correlation-data.service';

export interface LadderEventView {
  eventHorizon: EventHorizonRow;
  medianCalBp: number | null;
  hpd95: readonly HpdRange[];
  /** The posterior thinned for drawing (null without a posterior); `density` points are derived from it. */
  densityGrid: DensityGrid | null;
}

export interface LadderColumnView {
  site: SiteRow;
  /** The newest successful run, the one whose posteriors the column shows. */
  latestAgeModelRun: AgeModelRunRow | null;
  events: LadderEventView[];
}

export interface EventLadderView {
  /** `EventLadder.project` is read only when a client asks for it (`EventLadderService.project`). */
  projectId: string;
  columns: LadderColumnView[];
}

@Injectable()
export class EventLadderService {
  constructor(
    private readonly projects: ProjectsRepository,
    private readonly correlationData: CorrelationDataService,
    private readonly access: AccessService,
  ) {}

  /**
   * Every site of the project along strike with its events (oldest first) and their posteriors
   * from the site's newest successful age model run; events without one have no age.
   */
  async get(user: AuthUser, projectId: string): Promise<EventLadderView> {
    await this.access.requireAccess({ user, permission: Permission.ProjectRead, projectId });
    const data = await this.correlationData.load(projectId);
    const eventsBySite = new Map<string, LadderEventView[]>(data.sites.map((site) => [site.id, []]));
    for (const event of data.events) {
      const posterior = posteriorOf(data, event);
      eventsBySite.get(event.site.id)?.push({
        eventHorizon: event.eventHorizon,
        medianCalBp: posterior?.summary.medianCalBp ?? null,
        hpd95: posterior?.summary.hpd95 ?? [],
        densityGrid: posterior?.grid ?? null,
      });
    }
    return {
      projectId,
      columns: data.sites.map((site) => ({
        site,
        latestAgeModelRun: data.runsBySite.get(site.id)?.row ?? null,
        events: eventsBySite.get(site.id) ?? [],
      })),
    };
  }

  /** The ladder's project (the caller's access was checked when the ladder was read). */
  async project(ladder: EventLadderView): Promise<ProjectRow> {
    const project = await this.projects.findById(ladder.projectId);
    if (!project) throw notFound('project');
    return project;
  }
}

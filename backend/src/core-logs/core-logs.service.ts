import { Injectable } from '@nestjs/common';
import { AccessService } from '../access/access.service';
import { Permission } from '../access/permissions';
import { AuditService } from '../audit/audit.service';
import { AuthUser } from '../auth/auth-user';
import { badInput, notFound } from '../common/errors/domain-error';
import { withConstraintErrors } from '../common/errors/database-errors';
import { DatabaseService } from '../database/database.service';
import { SitesService } from '../sites/sites.service';
import { UnitsService } from '../units/units.service';
import { readCoreLogSheet, thinChannel, type CoreLogTrace } from './core-log-sheet';
import { CoreLogRow, CoreLogsRepository } from './core-logs.repository';
import { UploadCoreLogInput } from './dto/upload-core-log.input';

/** Site kinds that are cored and so may carry a physical-property log. */
const CORED_SITE_KINDS = new Set(['CORE', 'LAKE']);

/** At most this many points of one channel are sent for drawing. */
export const MAX_TRACE_POINTS = 2000;

/** A drawn channel: block means on true depth, with the unit. */
export interface CoreLogTraceView extends CoreLogTrace {
  channel: string;
  unit: string;
}

@Injectable()
export class CoreLogsService {
  constructor(
    private readonly database: DatabaseService,
    private readonly logs: CoreLogsRepository,
    private readonly sites: SitesService,
    private readonly units: UnitsService,
    private readonly access: AccessService,
    private readonly audit: AuditService,
  ) {}

  /** A site's logs; the site was already authorised by the caller's read of it. */
  listForSite(siteId: string): Promise<CoreLogRow[]> {
    return this.logs.listForSite(siteId);
  }

  /** Logs of the given sites, without access checks (callers check the project). */
  listForSites(siteIds: readonly string[]): Promise<CoreLogRow[]> {
    return this.logs.listForSites(siteIds);
  }

  /**
   * Check a log sheet row by row and store it on its core. Any problem refuses the whole sheet
   * as BAD_USER_INPUT on `csv`, listing the first problems by row (`extensions.problems`) and
   * their count; nothing is written.
   */
  async upload(user: AuthUser, input: UploadCoreLogInput): Promise<CoreLogRow> {
    const site = await this.sites.get(user, input.siteId, Permission.StratigraphyWrite);
    if (!CORED_SITE_KINDS.has(site.kind)) {
      throw badInput('siteId', `${site.name} is a ${site.kind.toLowerCase()} site; core logs belong to cores (CORE or LAKE sites).`);
    }
    const name = input.name.trim();
    if (name === '') throw badInput('name', 'a core log needs a name');
    const units = await this.units.listForSite(site.id);
    const columnBaseDepthM = units.length > 0 ? Math.max(...units.map((unit) => unit.baseDepthM)) : null;
    const reading = readCoreLogSheet(input.csv, { columnBaseDepthM });
    if (!reading.log) {
      const shown = reading.problems.map((problem) => (problem.row > 0 ? problem.message : `Header: ${problem.message}`));
      const more = reading.problemCount > shown.length ? ` (and ${reading.problemCount - shown.length} more)` : '';
      throw badInput('csv', `The log sheet has ${reading.problemCount} problem(s)${more}: ${shown.slice(0, 5).join(' ')}`, {
        problems: reading.problems,
        problemCount: reading.problemCount,
      });
    }
    const { log } = reading;
    const existing = await this.logs.listForSite(site.id);
    if (existing.some((other) => other.name.toLowerCase() === name.toLowerCase())) {
      throw badInput('name', `${site.name} already has a log named "${name}"; delete it first or choose another name.`);
    }
    return withConstraintErrors(() =>
      this.database.transaction(async (tx) => {
        const row = await this.logs.insert(
          {
            siteId: site.id,
            name,
            channels: log.channels.map((channel) => ({ name: channel.name, unit: channel.unit })),
            depthsM: [...log.depthsM],
            readings: log.values.map((values) => [...values]),
            rowCount: log.depthsM.length,
            topDepthM: log.depthsM[0],
            baseDepthM: log.depthsM[log.depthsM.length - 1],
            uploadedById: user.id,
          },
          tx,
        );
        const { depthsM: _depths, readings: _readings, ...summary } = row;
        await this.audit.record(tx, {
          actor: user, projectId: site.projectId, action: 'create', objectType: 'core_log', objectId: row.id, after: summary,
        });
        return row;
      }),
    );
  }

  async delete(user: AuthUser, id: string): Promise<boolean> {
    const log = await this.logs.findById(id);
    if (!log) throw notFound('core log');
    const site = await this.sites.get(user, log.siteId, Permission.StratigraphyWrite);
    await this.database.transaction(async (tx) => {
      await this.logs.delete(id, tx);
      const { depthsM: _depths, readings: _readings, ...summary } = log;
      await this.audit.record(tx, {
        actor: user, projectId: site.projectId, action: 'delete', objectType: 'core_log', objectId: id, before: summary,
      });
    });
    return true;
  }

  /** Each channel (or the named ones) as block means for drawing, at most `maxPoints` each. */
  traces(log: CoreLogRow, channels: readonly string[] | undefined, maxPoints: number): CoreLogTraceView[] {
    if (!Number.isInteger(maxPoints) || maxPoints < 2 || maxPoints > MAX_TRACE_POINTS) {
      throw badInput('maxPoints', `maxPoints must be a whole number from 2 to ${MAX_TRACE_POINTS}`);
    }
    const wanted = channels ? new Set(channels.map((c) => c.toLowerCase())) : null;
    return log.channels.flatMap((channel, c) =>
      wanted && !wanted.has(channel.name.toLowerCase())
        ? []
        : [{ channel: channel.name, unit: channel.unit, ...thinChannel(log.depthsM, log.readings[c], maxPoints) }],
    );
  }
}

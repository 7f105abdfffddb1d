import { INestApplicationContext, Logger } from '@nestjs/common';
import { writeFileSync } from 'node:fs';
import { AgeModelRunsRepository } from '../age-models/age-model-runs.repository';
import { AgeModelsService } from '../age-models/age-models.service';
import { APP_CONFIG, AppConfig } from '../config/config';
import { RecurrenceService } from '../recurrence/recurrence.service';
import { SegmentsService } from '../segments/segments.service';
import { SitesService } from '../sites/sites.service';
import { UsersRepository } from '../users/users.repository';
import { DEMO_PASSWORD, DemoSeeder } from './demo-seeder';
import { DEMO_PEOPLE } from './names';

/** Seed of the demo's age model runs and analysis, so a fresh demo shows the same numbers on every machine. */
const DEMO_RUN_SEED = 20_260_101;
/** The demo analyst's first analysis: the segment that records every margin-wide event. */
const DEMO_ANALYSIS_SEGMENT = 'Central';
const POLL_MS = 3_000;
const GIVE_UP_MS = 15 * 60_000;

/**
 * Seed the invented demo scenario when the database has no users yet (never in production: the
 * configuration refuses SEED_DEMO there), queue an age model run for every demo site, and once
 * they have finished queue the demo analyst's recurrence analysis, so a new user sees the whole
 * path from lab results to probabilities.
 */
export async function seedDemoIfEmpty(app: INestApplicationContext): Promise<void> {
  const demoAccountsFile = app.get<AppConfig>(APP_CONFIG).demoAccountsFile;
  if (demoAccountsFile) {
    const accounts = DEMO_PEOPLE.map(({ email, role }) => ({ email, password: DEMO_PASSWORD, role }));
    writeFileSync(demoAccountsFile, JSON.stringify(accounts, null, 2));
  }
  if ((await app.get(UsersRepository).count()) > 0) return;
  const logger = new Logger('DemoSeed');
  const { summary, projectId, siteIds } = await app.get(DemoSeeder).seed();
  logger.log(`seeded ${summary}`);
  const sites = app.get(SitesService);
  const ageModels = app.get(AgeModelsService);
  const runIds: string[] = [];
  for (const siteId of siteIds) {
    const site = await sites.findById(siteId);
    // Cores are dated through their hemipelagic mud (issue 12); other sites by the ordering model.
    const depthModel = site?.kind === 'CORE' ? 'HEMIPELAGIC_RATE' : 'ORDER_ONLY';
    if (site) runIds.push((await ageModels.queue(site, { seed: DEMO_RUN_SEED, depthModel }, null)).id);
  }
  logger.log(`queued ${runIds.length} age model runs`);
  queueAnalysisWhenRunsEnd(app, projectId, runIds, logger);
}

/** Poll (in the background) until the demo runs have ended, then start the demo analysis. */
function queueAnalysisWhenRunsEnd(app: INestApplicationContext, projectId: string, runIds: string[], logger: Logger): void {
  const startedAt = Date.now();
  const timer = setInterval(() => {
    void (async () => {
      const runs = app.get(AgeModelRunsRepository);
      const statuses = await Promise.all(runIds.map((id) => runs.statusOf(id)));
      if (statuses.some((s) => s === 'QUEUED' || s === 'RUNNING')) {
        if (Date.now() - startedAt > GIVE_UP_MS) throw new Error('the demo age model runs did not finish in time');
        return;
      }
      clearInterval(timer);
      const analyst = await app.get(UsersRepository).findByEmail(DEMO_PEOPLE.find((p) => p.role === 'ANALYST')!.email);
      const segment = (await app.get(SegmentsService).listForProject(projectId)).find((s) => s.name === DEMO_ANALYSIS_SEGMENT);
      if (!analyst || !segment) return;
      await app.get(RecurrenceService).start({ id: analyst.id, email: analyst.email }, { segmentId: segment.id, seed: DEMO_RUN_SEED });
      logger.log(`queued the demo recurrence analysis of the ${segment.name} segment`);
    })().catch((error: unknown) => {
      clearInterval(timer);
      logger.warn(`demo recurrence analysis not queued: ${error instanceof Error ? error.message : String(error)}`);
    });
  }, POLL_MS);
  timer.unref();
}

import { INestApplicationContext, Logger } from '@nestjs/common';
import { writeFileSync } from 'node:fs';
import { APP_CONFIG, AppConfig } from '../config/config';
import { AgeModelsService } from '../age-models/age-models.service';
import { DatabaseService } from '../database/database.service';
import { SitesService } from '../sites/sites.service';
import { DEMO_PASSWORD, DemoSeeder } from './demo-seeder';
import { DEMO_PEOPLE } from './names';

/** Seed of the demo's age model runs, so a fresh demo shows the same numbers on every machine. */
const DEMO_RUN_SEED = 20_260_101;

/**
 * Seed the invented demo scenario when the database has no users yet (never in production: the
 * configuration refuses SEED_DEMO there), and queue an age model run for every demo site so a
 * new user sees results at once.
 */
export async function seedDemoIfEmpty(app: INestApplicationContext): Promise<void> {
  const demoAccountsFile = app.get<AppConfig>(APP_CONFIG).demoAccountsFile;
  if (demoAccountsFile) {
    const accounts = DEMO_PEOPLE.map(({ email, role }) => ({ email, password: DEMO_PASSWORD, role }));
    writeFileSync(demoAccountsFile, JSON.stringify(accounts, null, 2));
  }
  const database = app.get(DatabaseService);
  const { rows } = await database.pool.query<{ count: string }>('select count(*)::text as count from users');
  if (rows[0].count !== '0') return;
  const logger = new Logger('DemoSeed');
  const { summary, siteIds } = await app.get(DemoSeeder).seed();
  logger.log(`seeded ${summary}`);
  const sites = app.get(SitesService);
  const ageModels = app.get(AgeModelsService);
  for (const siteId of siteIds) {
    const site = await sites.findById(siteId);
    if (site) await ageModels.queue(site, { seed: DEMO_RUN_SEED }, null);
  }
  logger.log(`queued ${siteIds.length} age model runs`);
}

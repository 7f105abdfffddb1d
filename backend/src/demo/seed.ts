import { INestApplicationContext } from '@nestjs/common';
import { DatabaseService } from '../database/database.service';
import { DemoSeeder } from './demo-seeder';

/** Seed the invented demo scenario when the database has no users yet (development only). */
export async function seedDemoIfEmpty(app: INestApplicationContext): Promise<void> {
  const seeder = app.get(DemoSeeder);
  const database = app.get(DatabaseService);
  const { rows } = await database.pool.query<{ count: string }>('select count(*)::text as count from users');
  if (rows[0].count !== '0') return;
  const summary = await seeder.seed();
  console.log(`Seeded the demo: ${summary}`);
}

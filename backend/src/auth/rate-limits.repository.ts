import { Injectable } from '@nestjs/common';
import { like } from 'drizzle-orm';
import { DatabaseService } from '../database/database.service';
import { rateLimits } from '../database/schema';

/**
 * The `rate_limits` table beyond what rate-limiter-flexible's store does itself: forgetting every
 * counter whose key starts with a prefix (all of one e-mail's sign-in counters, whatever the client).
 */
@Injectable()
export class RateLimitsRepository {
  constructor(private readonly database: DatabaseService) {}

  async deleteByPrefix(prefix: string): Promise<void> {
    const escaped = prefix.replace(/[\\%_]/g, (c) => `\\${c}`);
    await this.database.db.delete(rateLimits).where(like(rateLimits.key, `${escaped}%`));
  }
}

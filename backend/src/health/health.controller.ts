import { Controller, Get, HttpException, HttpStatus } from '@nestjs/common';
import { Public } from '../common/decorators/public.decorator';
import { DatabaseService } from '../database/database.service';

@Controller('health')
export class HealthController {
  constructor(private readonly database: DatabaseService) {}

  /** 200 `{"status":"ok"}` while the database answers; 503 `{"status":"unavailable"}` otherwise. */
  @Public()
  @Get()
  async health(): Promise<{ status: 'ok' }> {
    if (await this.database.isHealthy()) return { status: 'ok' };
    throw new HttpException({ status: 'unavailable', reason: 'database unreachable' }, HttpStatus.SERVICE_UNAVAILABLE);
  }
}

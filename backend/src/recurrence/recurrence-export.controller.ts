import { Controller, Get, Param, Res } from '@nestjs/common';
import type { Response } from 'express';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { RecurrenceExport } from './recurrence-export';
import type { RecurrenceComparison } from './recurrence-comparison';
import { RecurrenceService } from './recurrence.service';

/** Downloads of a finished analysis' tables (bearer token; any member who may read the project). */
@Controller('api/recurrence-analyses')
export class RecurrenceExportController {
  constructor(private readonly recurrence: RecurrenceService) {}

  @Get(':id/export.csv')
  async csv(@CurrentUser() user: AuthUser, @Param('id') id: string, @Res({ passthrough: true }) response: Response): Promise<string> {
    const { csv } = await this.recurrence.exportOf(user, id);
    response.setHeader('Content-Type', 'text/csv; charset=utf-8');
    response.setHeader('Content-Disposition', `attachment; filename="recurrence-analysis-${id}.csv"`);
    return csv;
  }

  @Get(':id/compare/:otherId/export.csv')
  async comparisonCsv(
    @CurrentUser() user: AuthUser,
    @Param('id') id: string,
    @Param('otherId') otherId: string,
    @Res({ passthrough: true }) response: Response,
  ): Promise<string> {
    const { csv } = await this.recurrence.comparisonExport(user, id, otherId);
    response.setHeader('Content-Type', 'text/csv; charset=utf-8');
    response.setHeader('Content-Disposition', `attachment; filename="recurrence-comparison-${id}-${otherId}.csv"`);
    return csv;
  }

  @Get(':id/compare/:otherId/export.json')
  async comparisonJson(
    @CurrentUser() user: AuthUser,
    @Param('id') id: string,
    @Param('otherId') otherId: string,
    @Res({ passthrough: true }) response: Response,
  ): Promise<RecurrenceComparison> {
    const { json } = await this.recurrence.comparisonExport(user, id, otherId);
    response.setHeader('Content-Disposition', `attachment; filename="recurrence-comparison-${id}-${otherId}.json"`);
    return json;
  }

  @Get(':id/export.json')
  async json(@CurrentUser() user: AuthUser, @Param('id') id: string, @Res({ passthrough: true }) response: Response): Promise<RecurrenceExport> {
    const { json } = await this.recurrence.exportOf(user, id);
    response.setHeader('Content-Disposition', `attachment; filename="recurrence-analysis-${id}.json"`);
    return json;
  }
}

import { Controller, Get, Param, Res } from '@nestjs/common';
import type { Response } from 'express';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { type ResultTable, tableCsv, tableJson } from './result-tables';
import { ResultTablesService } from './result-tables.service';

function sendCsv(response: Response, name: string, table: ResultTable): string {
  response.setHeader('Content-Type', 'text/csv; charset=utf-8');
  response.setHeader('Content-Disposition', `attachment; filename="${name}.csv"`);
  return tableCsv(table);
}

function sendJson(response: Response, name: string, table: ResultTable) {
  response.setHeader('Content-Disposition', `attachment; filename="${name}.json"`);
  return tableJson(table);
}

/**
 * The tables a paper needs, with the bearer token; members of the project only (others get 404,
 * as for a missing id). Each names its inputs and seed.
 */
@Controller('api')
export class ResultTablesController {
  constructor(private readonly tables: ResultTablesService) {}

  @Get('age-model-runs/:id/events.csv')
  async runEventsCsv(@CurrentUser() user: AuthUser, @Param('id') id: string, @Res({ passthrough: true }) response: Response) {
    return sendCsv(response, `event-ages-${id}`, await this.tables.runEvents(user, id));
  }

  @Get('age-model-runs/:id/events.json')
  async runEventsJson(@CurrentUser() user: AuthUser, @Param('id') id: string, @Res({ passthrough: true }) response: Response) {
    return sendJson(response, `event-ages-${id}`, await this.tables.runEvents(user, id));
  }

  @Get('hypotheses/:id/regional-events.csv')
  async regionalCsv(@CurrentUser() user: AuthUser, @Param('id') id: string, @Res({ passthrough: true }) response: Response) {
    return sendCsv(response, `regional-events-${id}`, await this.tables.regionalEvents(user, id));
  }

  @Get('hypotheses/:id/regional-events.json')
  async regionalJson(@CurrentUser() user: AuthUser, @Param('id') id: string, @Res({ passthrough: true }) response: Response) {
    return sendJson(response, `regional-events-${id}`, await this.tables.regionalEvents(user, id));
  }

  @Get('recurrence-analyses/:id/events.csv')
  async analysisCsv(@CurrentUser() user: AuthUser, @Param('id') id: string, @Res({ passthrough: true }) response: Response) {
    return sendCsv(response, `analysis-events-${id}`, await this.tables.analysisEvents(user, id));
  }

  @Get('recurrence-analyses/:id/events.json')
  async analysisJson(@CurrentUser() user: AuthUser, @Param('id') id: string, @Res({ passthrough: true }) response: Response) {
    return sendJson(response, `analysis-events-${id}`, await this.tables.analysisEvents(user, id));
  }

  @Get('releases/:id/bundle.json')
  async releaseBundle(@CurrentUser() user: AuthUser, @Param('id') id: string, @Res({ passthrough: true }) response: Response) {
    response.setHeader('Content-Disposition', `attachment; filename="release-${id}.json"`);
    return this.tables.releaseBundle(user, id);
  }
}

import { Body, Controller, Get, Header, HttpCode, Param, Post, Res } from '@nestjs/common';
import type { Response } from 'express';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { ExchangeService } from './exchange.service';
import { GEOJSON_MEDIA_TYPE } from './geojson';

/** A file name safe in a Content-Disposition header. */
function fileNameOf(text: string): string {
  return text.replace(/[^\w.-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 80) || 'project';
}

/**
 * Project exchange over plain HTTP (bearer token, as every route): the bundle, CSV tables and
 * GeoJSON of sites for members; importing a bundle as a new project for any signed-in user.
 */
@Controller('api/projects')
export class ExchangeController {
  constructor(private readonly exchange: ExchangeService) {}

  @Get(':id/bundle.json')
  async bundle(@CurrentUser() user: AuthUser, @Param('id') id: string, @Res({ passthrough: true }) response: Response) {
    const { bundle, project } = await this.exchange.exportBundle(user, id);
    response.setHeader('Content-Disposition', `attachment; filename="${fileNameOf(project.name)}.stratochron.json"`);
    return bundle;
  }

  @Get(':id/sites.geojson')
  async sites(@CurrentUser() user: AuthUser, @Param('id') id: string, @Res({ passthrough: true }) response: Response) {
    const collection = await this.exchange.sitesGeoJson(user, id);
    response.setHeader('Content-Type', GEOJSON_MEDIA_TYPE);
    return JSON.stringify(collection);
  }

  @Get(':id/export/:table.csv')
  async csv(
    @CurrentUser() user: AuthUser,
    @Param('id') id: string,
    @Param('table') table: string,
    @Res({ passthrough: true }) response: Response,
  ) {
    const { csv } = await this.exchange.exportCsv(user, id, table);
    response.setHeader('Content-Type', 'text/csv; charset=utf-8');
    response.setHeader('Content-Disposition', `attachment; filename="${table}.csv"`);
    return csv;
  }

  /** Body: a `stratochron-bundle` JSON document. Answers 201 with the new project's id and name. */
  @Post('import')
  @HttpCode(201)
  @Header('Cache-Control', 'no-store')
  async import(@CurrentUser() user: AuthUser, @Body() body: unknown) {
    const project = await this.exchange.importBundle(user, body);
    return { id: project.id, name: project.name };
  }
}

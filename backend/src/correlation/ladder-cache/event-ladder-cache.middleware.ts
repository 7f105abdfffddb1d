import { Injectable, NestMiddleware } from '@nestjs/common';
import type { NextFunction, Request, Response } from 'express';
import { EventLadderCache, GraphqlHttpBody } from './event-ladder-cache';

/**
 * Serves a stored event-ladder answer before the request reaches GraphQL, as the exact bytes
 * ordinary execution produced (gzip-compressed when the client accepts it). Mounted on
 * `POST /graphql`; anything it cannot answer from `EventLadderCache` passes on unchanged.
 * A served answer carries `X-Cache: hit`.
 */
@Injectable()
export class EventLadderCacheMiddleware implements NestMiddleware {
  constructor(private readonly cache: EventLadderCache) {}

  use(req: Request, res: Response, next: NextFunction): void {
    const body = req.body as Partial<GraphqlHttpBody> | undefined;
    if (req.method !== 'POST' || !req.is('application/json') || typeof body?.query !== 'string') return next();
    const claims = this.cache.bearerClaims(req.headers.authorization);
    if (!claims) return next();
    const requestKey = this.cache.requestKey(body as GraphqlHttpBody);
    if (!this.cache.projectOf(requestKey)) return next();
    this.cache.current(requestKey, claims).then(
      (entry) => {
        if (!entry) return next();
        const gzip = req.acceptsEncodings('gzip', 'identity') === 'gzip';
        res.status(200);
        res.setHeader('Content-Type', 'application/json; charset=utf-8');
        res.setHeader('Vary', 'Accept-Encoding');
        res.setHeader('X-Cache', 'hit');
        if (gzip) res.setHeader('Content-Encoding', 'gzip');
        res.end(gzip ? entry.gzip : entry.json);
      },
      // A failed check (the database is away) is left to ordinary execution to report.
      () => next(),
    );
  }
}

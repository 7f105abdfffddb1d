import { Controller, Get, Header, Inject, NotFoundException, Req } from '@nestjs/common';
import type { Request } from 'express';
import { Public } from '../common/decorators/public.decorator';
import { APP_CONFIG, AppConfig } from '../config/config';
import type { CapturedMessage } from '../fakes/smtp-fake';
import { escapeHtml } from './mail-templates';

/** Make the links in an escaped text body clickable. */
function linkify(escapedText: string): string {
  return escapedText.replace(/https?:\/\/[^\s<]+/g, (url) => `<a href="${url}">${url}</a>`);
}

export function renderMailPage(messages: CapturedMessage[] | undefined, problem?: string): string {
  const items = (messages ?? []).map(
    (m) =>
      `<article><h2>${escapeHtml(m.subject || '(no subject)')}</h2>` +
      `<p class="meta">${escapeHtml(m.receivedAt)} · from ${escapeHtml(m.from)} · to ${escapeHtml(m.to.join(', '))}</p>` +
      `<pre>${linkify(escapeHtml(m.text ?? '(no text body)'))}</pre></article>`,
  );
  const body = problem
    ? `<p class="problem">${escapeHtml(problem)}</p>`
    : items.length > 0
      ? items.join('')
      : '<p>No mail captured yet.</p>';
  return (
    '<!doctype html><html><head><meta charset="utf-8"><title>Captured mail · Stratochron development</title>' +
    '<style>body{font-family:system-ui,sans-serif;max-width:60rem;margin:2rem auto;padding:0 1rem}' +
    'article{border-top:1px solid #ccc;padding:.5rem 0}.meta{color:#555;font-size:.9em}pre{white-space:pre-wrap}' +
    '.problem{color:#a00}</style></head><body><h1>Captured mail</h1>' +
    '<p>Development only: what the API sent to the local SMTP fake, newest first.</p>' +
    `${body}</body></html>`
  );
}

const LOOPBACK = /^(127\.\d+\.\d+\.\d+|::1|::ffff:127\.\d+\.\d+\.\d+)$/;

/**
 * Whether a request may read captured mail: straight from a loopback connection, not relayed by a
 * proxy (a proxy on this machine would make every visitor look local).
 */
export function isLocalRequest(request: Pick<Request, 'headers'> & { socket: { remoteAddress?: string } }): boolean {
  const relayed = request.headers['x-forwarded-for'] !== undefined || request.headers.forwarded !== undefined;
  return !relayed && LOOPBACK.test(request.socket.remoteAddress ?? '');
}

/**
 * `GET /dev/mail`: the mail the local SMTP fake captured (reset and invitation links). Only with
 * DEV_MAIL_PAGE=true (npm start sets it; never in production) and only to loopback clients;
 * 404 otherwise, as if there were no such page.
 */
@Controller('dev')
export class DevMailController {
  constructor(@Inject(APP_CONFIG) private readonly config: AppConfig) {}

  @Public()
  @Get('mail')
  @Header('content-type', 'text/html; charset=utf-8')
  @Header('cache-control', 'no-store')
  async mail(@Req() request: Request): Promise<string> {
    const listingUrl = this.config.mailFakeUrl;
    if (!this.config.devMailPage || this.config.nodeEnv === 'production' || !listingUrl || !isLocalRequest(request)) throw new NotFoundException();
    try {
      const response = await fetch(`${listingUrl}/messages`, { signal: AbortSignal.timeout(5000) });
      if (!response.ok) return renderMailPage(undefined, `the SMTP fake at ${listingUrl} answered ${response.status}`);
      return renderMailPage((await response.json()) as CapturedMessage[]);
    } catch (error) {
      const reason = error instanceof Error ? error.message : String(error);
      return renderMailPage(undefined, `the SMTP fake at ${listingUrl} does not answer (${reason}); is it running?`);
    }
  }
}

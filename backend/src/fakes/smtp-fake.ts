import { randomUUID } from 'node:crypto';
import { mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { createServer, Server } from 'node:http';
import { AddressInfo } from 'node:net';
import { join } from 'node:path';
import { SMTPServer } from 'smtp-server';
import { parseMessage } from './mime';

/** A message the fake accepted, as its HTTP listing returns it. */
export interface CapturedMessage {
  id: string;
  receivedAt: string;
  /** Envelope sender and recipients (what the SMTP client said, not the headers). */
  from: string;
  to: string[];
  subject: string;
  text?: string;
  html?: string;
  raw: string;
}

export interface SmtpFakeOptions {
  host?: string;
  /** SMTP port; 0 picks a free one. */
  smtpPort?: number;
  /** Port of the JSON listing (`GET /messages`); 0 picks a free one. */
  httpPort?: number;
  /** Keep messages as JSON files here (they survive restarts); in memory only when absent. */
  mailDir?: string;
}

export interface SmtpFake {
  readonly smtpPort: number;
  readonly httpPort: number;
  /** Base URL of the listing, e.g. `http://127.0.0.1:2526` (the API's MAIL_FAKE_URL). */
  readonly listingUrl: string;
  /** Captured messages, newest first. */
  messages(): CapturedMessage[];
  clear(): void;
  close(): Promise<void>;
}

const MAX_MESSAGE_BYTES = 10 * 1024 * 1024;

function loadSaved(mailDir: string): CapturedMessage[] {
  mkdirSync(mailDir, { recursive: true });
  return readdirSync(mailDir)
    .filter((name) => name.endsWith('.json'))
    .map((name) => JSON.parse(readFileSync(join(mailDir, name), 'utf8')) as CapturedMessage);
}

function listen(server: Server | SMTPServer, port: number, host: string): Promise<number> {
  return new Promise((resolve, reject) => {
    const net = server instanceof SMTPServer ? server.server : server;
    net.once('error', reject);
    server.listen(port, host, () => {
      net.off('error', reject);
      resolve((net.address() as AddressInfo).port);
    });
  });
}

/**
 * A local SMTP server for development and tests: accepts every message from anyone (any or no
 * credentials, no TLS) and lists what it received as JSON over HTTP, so people and tests can read
 * the invitation and reset links the API sent. Never for production.
 */
export async function startSmtpFake(options: SmtpFakeOptions = {}): Promise<SmtpFake> {
  const host = options.host ?? '127.0.0.1';
  let captured: CapturedMessage[] = options.mailDir ? loadSaved(options.mailDir) : [];
  const newestFirst = () => [...captured].sort((a, b) => b.receivedAt.localeCompare(a.receivedAt));

  const smtp = new SMTPServer({
    logger: false,
    authOptional: true,
    allowInsecureAuth: true,
    disabledCommands: ['STARTTLS'],
    size: MAX_MESSAGE_BYTES,
    onAuth: (auth, _session, callback) => callback(null, { user: auth.username ?? 'anyone' }),
    onData: (stream, session, callback) => {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('error', callback);
      stream.on('end', () => {
        const raw = Buffer.concat(chunks).toString('utf8');
        const parsed = parseMessage(raw);
        const mailFrom = session.envelope.mailFrom;
        const message: CapturedMessage = {
          id: randomUUID(),
          receivedAt: new Date().toISOString(),
          from: mailFrom ? mailFrom.address : '',
          to: session.envelope.rcptTo.map((r) => r.address),
          subject: parsed.subject,
          text: parsed.text,
          html: parsed.html,
          raw,
        };
        captured.push(message);
        if (options.mailDir) {
          writeFileSync(join(options.mailDir, `${message.receivedAt.replace(/[:.]/g, '-')}-${message.id}.json`), JSON.stringify(message));
        }
        callback();
      });
    },
  });

  const listing = createServer((req, res) => {
    const path = (req.url ?? '/').split('?')[0];
    if (path === '/messages' && req.method === 'GET') {
      res.writeHead(200, { 'content-type': 'application/json; charset=utf-8' });
      res.end(JSON.stringify(newestFirst()));
    } else if (path === '/messages' && req.method === 'DELETE') {
      captured = [];
      res.writeHead(204).end();
    } else {
      res.writeHead(404, { 'content-type': 'text/plain' }).end('GET /messages lists captured mail\n');
    }
  });

  const smtpPort = await listen(smtp, options.smtpPort ?? 0, host);
  const httpPort = await listen(listing, options.httpPort ?? 0, host);
  return {
    smtpPort,
    httpPort,
    listingUrl: `http://${host}:${httpPort}`,
    messages: newestFirst,
    clear: () => {
      captured = [];
    },
    close: async () => {
      await new Promise<void>((resolve) => smtp.close(() => resolve()));
      await new Promise<void>((resolve) => {
        listing.closeAllConnections();
        listing.close(() => resolve());
      });
    },
  };
}

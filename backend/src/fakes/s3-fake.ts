import { createHash, randomUUID } from 'node:crypto';
import { mkdir, readFile, rm, stat, writeFile } from 'node:fs/promises';
import { createServer, IncomingMessage, Server, ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { join } from 'node:path';

/**
 * A local stand-in for an S3-compatible object store, for development and tests only. It speaks
 * just enough of the S3 REST protocol (path-style addressing) for the AWS SDK v3 client to create
 * and check a bucket and put, get, head and delete objects. Signatures are not checked: it listens
 * on loopback and holds nothing of value. Objects are files under `dataDir/<bucket>/`, each with a
 * JSON sidecar holding its content type and ETag.
 */
export interface S3FakeOptions {
  port: number;
  dataDir: string;
  host?: string;
}

export interface S3Fake {
  server: Server;
  /** Base URL to configure as the S3 endpoint (path-style). */
  endpoint: string;
  port: number;
  close(): Promise<void>;
}

interface ObjectMeta {
  contentType: string;
  etag: string;
  lastModified: string;
  size: number;
}

const BUCKET_NAME = /^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/;

export async function startS3Fake({ port, dataDir, host = '127.0.0.1' }: S3FakeOptions): Promise<S3Fake> {
  await mkdir(dataDir, { recursive: true });
  const server = createServer((request, response) => {
    handle(dataDir, request, response).catch((error: unknown) => {
      sendError(response, 500, 'InternalError', error instanceof Error ? error.message : String(error), request.method);
    });
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => resolve());
  });
  const actualPort = (server.address() as AddressInfo).port;
  return {
    server,
    port: actualPort,
    endpoint: `http://${host}:${actualPort}`,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

async function handle(dataDir: string, request: IncomingMessage, response: ServerResponse): Promise<void> {
  const url = new URL(request.url ?? '/', 'http://fake');
  const [bucket, ...keyParts] = url.pathname.replace(/^\//, '').split('/');
  const key = decodeURIComponent(keyParts.join('/'));
  const method = request.method ?? 'GET';
  if (!bucket || !BUCKET_NAME.test(bucket)) return sendError(response, 400, 'InvalidBucketName', 'The specified bucket is not valid.', method);
  const bucketDir = join(dataDir, bucket);
  const bucketExists = await exists(bucketDir);

  if (!key) {
    if (method === 'PUT') {
      await drain(request);
      await mkdir(bucketDir, { recursive: true });
      response.writeHead(200, { Location: `/${bucket}`, 'x-amz-request-id': randomUUID() }).end();
      return;
    }
    if (method === 'HEAD') {
      response.writeHead(bucketExists ? 200 : 404, { 'x-amz-request-id': randomUUID() }).end();
      return;
    }
    return sendError(response, 501, 'NotImplemented', `${method} on a bucket is not implemented by the fake`, method);
  }

  if (!bucketExists) {
    await drain(request);
    return sendError(response, 404, 'NoSuchBucket', 'The specified bucket does not exist.', method, { BucketName: bucket });
  }
  const objectPath = join(bucketDir, encodeURIComponent(key));
  const metaPath = `${objectPath}.meta.json`;

  switch (method) {
    case 'PUT': {
      const raw = await readBody(request);
      const body = isAwsChunked(request) ? decodeAwsChunked(raw) : raw;
      const meta: ObjectMeta = {
        contentType: header(request, 'content-type') ?? 'application/octet-stream',
        etag: `"${createHash('md5').update(body).digest('hex')}"`,
        lastModified: new Date().toUTCString(),
        size: body.length,
      };
      await writeFile(objectPath, body);
      await writeFile(metaPath, JSON.stringify(meta));
      response.writeHead(200, { ETag: meta.etag, 'x-amz-request-id': randomUUID() }).end();
      return;
    }
    case 'GET':
    case 'HEAD': {
      const meta = await readMeta(metaPath);
      if (!meta) return sendError(response, 404, 'NoSuchKey', 'The specified key does not exist.', method, { Key: key });
      response.writeHead(200, {
        'Content-Type': meta.contentType,
        'Content-Length': String(meta.size),
        ETag: meta.etag,
        'Last-Modified': meta.lastModified,
        'Accept-Ranges': 'bytes',
        'x-amz-request-id': randomUUID(),
      });
      if (method === 'HEAD') return void response.end();
      response.end(await readFile(objectPath));
      return;
    }
    case 'DELETE':
      // S3 answers 204 whether or not the key existed.
      await rm(objectPath, { force: true });
      await rm(metaPath, { force: true });
      response.writeHead(204, { 'x-amz-request-id': randomUUID() }).end();
      return;
    default:
      return sendError(response, 501, 'NotImplemented', `${method} on an object is not implemented by the fake`, method);
  }
}

/** The XML error body the SDK parses into a named exception (NoSuchKey, NoSuchBucket). HEAD answers carry no body. */
function sendError(
  response: ServerResponse,
  status: number,
  code: string,
  message: string,
  method: string | undefined,
  extra: Record<string, string> = {},
): void {
  if (response.headersSent) return void response.end();
  const requestId = randomUUID();
  const fields = Object.entries(extra).map(([name, value]) => `<${name}>${escapeXml(value)}</${name}>`).join('');
  const body =
    `<?xml version="1.0" encoding="UTF-8"?>\n<Error><Code>${code}</Code><Message>${escapeXml(message)}</Message>` +
    `${fields}<RequestId>${requestId}</RequestId></Error>`;
  response.writeHead(status, { 'Content-Type': 'application/xml', 'x-amz-request-id': requestId });
  response.end(method === 'HEAD' ? undefined : body);
}

function escapeXml(text: string): string {
  return text.replace(/[<>&'"]/g, (c) => `&#${c.charCodeAt(0)};`);
}

function header(request: IncomingMessage, name: string): string | undefined {
  const value = request.headers[name];
  return Array.isArray(value) ? value[0] : value;
}

function isAwsChunked(request: IncomingMessage): boolean {
  return (header(request, 'content-encoding') ?? '').includes('aws-chunked') || (header(request, 'x-amz-content-sha256') ?? '').startsWith('STREAMING-');
}

/**
 * The SDK sends streamed bodies in the `aws-chunked` framing: `<hex size>[;extensions]\r\n<bytes>\r\n`
 * repeated, a zero-size chunk, then optional trailer headers (checksums).
 */
export function decodeAwsChunked(raw: Buffer): Buffer {
  const parts: Buffer[] = [];
  let offset = 0;
  while (offset < raw.length) {
    const lineEnd = raw.indexOf('\r\n', offset);
    if (lineEnd < 0) break;
    const size = parseInt(raw.subarray(offset, lineEnd).toString('latin1').split(';')[0], 16);
    if (!Number.isFinite(size) || size === 0) break;
    parts.push(raw.subarray(lineEnd + 2, lineEnd + 2 + size));
    offset = lineEnd + 2 + size + 2;
  }
  return Buffer.concat(parts);
}

async function readBody(request: IncomingMessage): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of request) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks);
}

async function drain(request: IncomingMessage): Promise<void> {
  for await (const _chunk of request) {
    // discard
  }
}

async function exists(path: string): Promise<boolean> {
  try {
    await stat(path);
    return true;
  } catch {
    return false;
  }
}

async function readMeta(path: string): Promise<ObjectMeta | undefined> {
  try {
    return JSON.parse(await readFile(path, 'utf8')) as ObjectMeta;
  } catch {
    return undefined;
  }
}

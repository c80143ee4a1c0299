/**
 * The browser host: the same API as the Electron window, over HTTP on 127.0.0.1 only.
 * - `POST /api/<operation>` with a JSON body → `ApiResult` JSON (errors as values, with a matching HTTP status).
 * - Every API call must carry the per-start random token (header `x-pairwright-token`), which only the page
 *   served by this host knows (it is written into index.html), and a Host header naming this host,
 *   so other local pages and DNS-rebinding tricks cannot call it.
 * - Everything else serves the built renderer (dist/renderer), with a strict Content-Security-Policy.
 */
import { randomBytes, timingSafeEqual } from 'node:crypto';
import { existsSync, readFileSync, statSync } from 'node:fs';
import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { extname, join, normalize, sep } from 'node:path';
import type { ApiResult } from '../../shared-model/api/result';
import { dispatch } from '../services/dispatch';
import type { ServiceContext } from '../services/context';

export const TOKEN_HEADER = 'x-pairwright-token';
const MAX_BODY_BYTES = 20 * 1024 * 1024;

export const CONTENT_SECURITY_POLICY =
  "default-src 'self'; script-src 'self'; style-src 'self' 'unsafe-inline'; img-src 'self' data: blob:; font-src 'self'; connect-src 'self'; object-src 'none'; base-uri 'none'; frame-ancestors 'none'; form-action 'none'";

const CONTENT_TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.ico': 'image/x-icon',
  '.json': 'application/json; charset=utf-8',
  '.woff2': 'font/woff2',
};

export interface HostOptions {
  context: ServiceContext;
  rendererDir: string;
  /** 0 picks a free port. */
  port: number;
}

export interface RunningHost {
  url: string;
  port: number;
  token: string;
  server: Server;
  close(): Promise<void>;
}

const STATUS_BY_CODE: Record<string, number> = {
  invalid_input: 400,
  unsupported: 400,
  not_found: 404,
  unknown_operation: 404,
  conflict: 409,
  forbidden: 403,
  cancelled: 409,
  internal: 500,
};

function sendJson(response: ServerResponse, status: number, body: unknown): void {
  const text = JSON.stringify(body);
  response.writeHead(status, {
    'content-type': 'application/json; charset=utf-8',
    'cache-control': 'no-store',
    'x-content-type-options': 'nosniff',
  });
  response.end(text);
}

function readBody(request: IncomingMessage): Promise<string> {
  return new Promise((resolvePromise, reject) => {
    const chunks: Buffer[] = [];
    let size = 0;
    request.on('data', (chunk: Buffer) => {
      size += chunk.length;
      if (size > MAX_BODY_BYTES) {
        reject(new Error(`request body larger than ${MAX_BODY_BYTES / 1024 / 1024} MB`));
        request.destroy();
        return;
      }
      chunks.push(chunk);
    });
    request.on('end', () => resolvePromise(Buffer.concat(chunks).toString('utf8')));
    request.on('error', reject);
  });
}

function tokensMatch(given: string | string[] | undefined, expected: string): boolean {
  if (typeof given !== 'string' || given.length !== expected.length) return false;
  return timingSafeEqual(Buffer.from(given), Buffer.from(expected));
}

export function startHost(options: HostOptions): Promise<RunningHost> {
  const token = randomBytes(24).toString('hex');
  const indexPath = join(options.rendererDir, 'index.html');
  if (!existsSync(indexPath)) {
    return Promise.reject(new Error(`the renderer is not built (${indexPath} missing); run "npm run build:renderer" first`));
  }
  let allowedHosts: Set<string> = new Set();

  const serveStatic = (pathname: string, response: ServerResponse): void => {
    const relative = normalize(decodeURIComponent(pathname)).replace(/^([/\\])+/, '');
    const candidate = join(options.rendererDir, relative);
    const inside = candidate === options.rendererDir || candidate.startsWith(options.rendererDir + sep);
    const file = inside && relative !== '' && existsSync(candidate) && statSync(candidate).isFile() ? candidate : indexPath;
    const headers: Record<string, string> = {
      'content-type': CONTENT_TYPES[extname(file)] ?? 'application/octet-stream',
      'content-security-policy': CONTENT_SECURITY_POLICY,
      'x-content-type-options': 'nosniff',
      'referrer-policy': 'no-referrer',
    };
    if (file === indexPath) {
      const html = readFileSync(indexPath, 'utf8').replace('</head>', `<meta name="pairwright-token" content="${token}"></head>`);
      response.writeHead(200, { ...headers, 'cache-control': 'no-store' });
      response.end(html);
      return;
    }
    response.writeHead(200, headers);
    response.end(readFileSync(file));
  };

  const handle = async (request: IncomingMessage, response: ServerResponse): Promise<void> => {
    if (!allowedHosts.has(request.headers.host ?? '')) {
      sendJson(response, 421, { ok: false, error: { code: 'forbidden', message: 'unexpected Host header' } });
      return;
    }
    const url = new URL(request.url ?? '/', 'http://127.0.0.1');
    if (!url.pathname.startsWith('/api/')) {
      if (request.method !== 'GET' && request.method !== 'HEAD') {
        sendJson(response, 405, { ok: false, error: { code: 'forbidden', message: 'only GET for pages' } });
        return;
      }
      serveStatic(url.pathname, response);
      return;
    }
    if (request.method !== 'POST') {
      sendJson(response, 405, { ok: false, error: { code: 'forbidden', message: 'API calls use POST' } });
      return;
    }
    if (!tokensMatch(request.headers[TOKEN_HEADER], token)) {
      sendJson(response, 403, { ok: false, error: { code: 'forbidden', message: 'missing or wrong session token; reload the page opened from the address the host printed' } });
      return;
    }
    const operation = decodeURIComponent(url.pathname.slice('/api/'.length));
    let input: unknown;
    try {
      const body = await readBody(request);
      input = body.trim() === '' ? {} : JSON.parse(body);
    } catch (error) {
      const message = error instanceof Error ? error.message : String(error);
      sendJson(response, 400, { ok: false, error: { code: 'invalid_input', message: `request body is not valid JSON: ${message}` } });
      return;
    }
    const result: ApiResult<unknown> = await dispatch(options.context, operation, input);
    sendJson(response, result.ok ? 200 : (STATUS_BY_CODE[result.error.code] ?? 400), result);
  };

  const server = createServer((request, response) => {
    handle(request, response).catch((error: unknown) => {
      console.error('[pairwright host] request failed:', error);
      if (!response.headersSent) sendJson(response, 500, { ok: false, error: { code: 'internal', message: String(error) } });
      else response.destroy();
    });
  });

  return new Promise((resolvePromise, reject) => {
    server.once('error', reject);
    server.listen(options.port, '127.0.0.1', () => {
      const port = (server.address() as AddressInfo).port;
      allowedHosts = new Set([`127.0.0.1:${port}`, `localhost:${port}`]);
      resolvePromise({
        url: `http://127.0.0.1:${port}/`,
        port,
        token,
        server,
        close: () =>
          new Promise<void>((done, fail) => {
            server.closeAllConnections();
            server.close((error) => (error ? fail(error) : done()));
          }),
      });
    });
  });
}

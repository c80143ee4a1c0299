/**
 * The browser host: the same API as the Electron window, over HTTP on 127.0.0.1 only.
 * - Login: the host prints an address with a one-time login key (`/?login=…`) in the terminal of the person who
 *   started it. Opening it swaps the key for an HttpOnly, SameSite=Strict session cookie and redirects to the
 *   same address without the key. A used or unknown key is refused; nothing secret is ever sent to a request
 *   without a session (another account on the machine can reach 127.0.0.1, but not that terminal).
 * - `POST /api/<operation>` with a JSON body → `ApiResult` JSON (errors as values, with a matching HTTP status).
 *   API calls need the session cookie, the header `x-pairwright-call: 1` (a cross-origin page cannot send it
 *   without a preflight, which is refused), no foreign Origin, and a Host header naming this host
 *   (DNS rebinding).
 * - Everything else serves the built renderer (dist/renderer) to a logged-in browser, with a strict CSP.
 */
import { randomBytes, timingSafeEqual } from 'node:crypto';
import { existsSync, readFileSync, statSync } from 'node:fs';
import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { extname, join, normalize, sep } from 'node:path';
import type { ApiResult } from '../../shared-model/api/result';
import { dispatch } from '../services/dispatch';
import type { ServiceContext } from '../services/context';

/** The header every API call carries; its presence forces a CORS preflight on cross-origin pages. */
export const CALL_HEADER = 'x-pairwright-call';
export const LOGIN_PARAMETER = 'login';
export const MAX_BODY_BYTES = 20 * 1024 * 1024;
/** JSON bodies nested deeper than this are refused before parsing (the deepest operation input is under 10 levels). */
export const MAX_BODY_DEPTH = 64;
/**
 * Slow senders are cut off: headers within 10 s, the whole request (body included) within 60 s (common practice);
 * the server checks its connections against these every second (Node's default is every 30 s).
 */
export const HOST_TIMEOUTS = { headersMs: 10_000, requestMs: 60_000, checkEveryMs: 1_000 } as const;

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
  /** Called after a login key was used (serve.ts then prints a fresh address for another browser). */
  onLogin?: () => void;
  /** Slow-sender limits; HOST_TIMEOUTS unless given (tests shorten them). */
  timeouts?: { headersMs: number; requestMs: number; checkEveryMs: number };
}

export interface RunningHost {
  /** The address to open: carries a one-time login key. Print it only to the person who started the host. */
  url: string;
  /** `http://127.0.0.1:<port>`, without any key. */
  origin: string;
  port: number;
  /** Name of this host's session cookie (it names the port: cookies are shared between ports of one host). */
  cookieName: string;
  /** A fresh one-time login address for another browser; `path` may carry a `#/view` fragment. */
  issueLoginUrl(path?: string): string;
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

const SECURITY_HEADERS = {
  'x-content-type-options': 'nosniff',
  'referrer-policy': 'no-referrer',
  'cache-control': 'no-store',
};

function sendJson(
  response: ServerResponse,
  status: number,
  body: unknown,
  extraHeaders: Record<string, string> = {},
): void {
  const text = JSON.stringify(body);
  response.writeHead(status, {
    'content-type': 'application/json; charset=utf-8',
    ...SECURITY_HEADERS,
    ...extraHeaders,
  });
  response.end(text);
}

function refuse(response: ServerResponse, status: number, code: string, message: string): void {
  sendJson(response, status, { ok: false, error: { code, message } });
}

/** A small page for browsers that are not logged in; it carries no key and no data. */
function sendLoginNeeded(response: ServerResponse, status: number, reason: string): void {
  const html = `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Pairwright — log in</title></head>
<body><h1>Pairwright</h1><p>${reason}</p>
<p>Open the address printed in the terminal where the host was started (<code>npm run serve</code>); it carries a
one-time login key. Restart the host to get a new address.</p></body></html>`;
  response.writeHead(status, {
    'content-type': 'text/html; charset=utf-8',
    'content-security-policy': CONTENT_SECURITY_POLICY,
    ...SECURITY_HEADERS,
  });
  response.end(html);
}

class BodyTooLarge extends Error {}

function readBody(request: IncomingMessage): Promise<string> {
  return new Promise((resolvePromise, reject) => {
    const declared = Number(request.headers['content-length'] ?? 0);
    if (declared > MAX_BODY_BYTES) {
      request.resume();
      reject(new BodyTooLarge());
      return;
    }
    const chunks: Buffer[] = [];
    let size = 0;
    let tooLarge = false;
    request.on('data', (chunk: Buffer) => {
      if (tooLarge) return;
      size += chunk.length;
      if (size > MAX_BODY_BYTES) {
        tooLarge = true;
        chunks.length = 0;
        reject(new BodyTooLarge());
        return;
      }
      chunks.push(chunk);
    });
    request.on('end', () => {
      if (!tooLarge) resolvePromise(Buffer.concat(chunks).toString('utf8'));
    });
    request.on('error', reject);
  });
}

/**
 * Whether a JSON text nests arrays/objects deeper than `limit`: one pass over the characters, skipping strings,
 * so a body of 100,000 opening brackets is refused without any recursion.
 */
export function jsonNestsDeeperThan(text: string, limit: number): boolean {
  let depth = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 0x5c)
        i++; // backslash: skip the escaped character
      else if (c === 0x22) inString = false;
    } else if (c === 0x22) inString = true;
    else if (c === 0x5b || c === 0x7b) {
      if (++depth > limit) return true;
    } else if (c === 0x5d || c === 0x7d) depth--;
  }
  return false;
}

function secretsMatch(given: string, expected: string): boolean {
  if (given.length !== expected.length) return false;
  return timingSafeEqual(Buffer.from(given), Buffer.from(expected));
}

function findSecret(given: string | null | undefined, known: Iterable<string>): string | null {
  if (!given) return null;
  for (const secret of known) if (secretsMatch(given, secret)) return secret;
  return null;
}

function readCookie(request: IncomingMessage, name: string): string | null {
  const header = request.headers.cookie;
  if (!header) return null;
  for (const part of header.split(';')) {
    const [key, ...value] = part.trim().split('=');
    if (key === name) return value.join('=');
  }
  return null;
}

function newSecret(): string {
  return randomBytes(32).toString('base64url');
}

function decodePath(pathname: string): string | null {
  try {
    return decodeURIComponent(pathname);
  } catch (error) {
    if (error instanceof URIError) return null;
    throw error;
  }
}

export function startHost(options: HostOptions): Promise<RunningHost> {
  const indexPath = join(options.rendererDir, 'index.html');
  if (!existsSync(indexPath)) {
    return Promise.reject(
      new Error(`the renderer is not built (${indexPath} missing); run "npm run build:renderer" first`),
    );
  }
  const loginKeys = new Set<string>();
  const sessions = new Set<string>();
  let allowedHosts: Set<string> = new Set();
  let allowedOrigins: Set<string> = new Set();
  let port = 0;
  let cookieName = 'pairwright_session';

  const issueLoginUrl = (path = '/'): string => {
    const key = newSecret();
    loginKeys.add(key);
    const [pathname, fragment] = path.split('#', 2);
    return `http://127.0.0.1:${port}${pathname ?? '/'}?${LOGIN_PARAMETER}=${key}${fragment === undefined ? '' : `#${fragment}`}`;
  };

  const serveStatic = (pathname: string, response: ServerResponse): void => {
    const relative = normalize(pathname).replace(/^([/\\])+/, '');
    const candidate = join(options.rendererDir, relative);
    const inside = candidate === options.rendererDir || candidate.startsWith(options.rendererDir + sep);
    const file =
      inside && relative !== '' && existsSync(candidate) && statSync(candidate).isFile() ? candidate : indexPath;
    const headers: Record<string, string> = {
      'content-type': CONTENT_TYPES[extname(file)] ?? 'application/octet-stream',
      'content-security-policy': CONTENT_SECURITY_POLICY,
      'x-content-type-options': 'nosniff',
      'referrer-policy': 'no-referrer',
    };
    response.writeHead(200, file === indexPath ? { ...headers, 'cache-control': 'no-store' } : headers);
    response.end(readFileSync(file));
  };

  /** `GET …?login=KEY`: a fresh key becomes a session cookie; the key is forgotten at once. */
  const handleLogin = (request: IncomingMessage, url: URL, response: ServerResponse, hasSession: boolean): void => {
    const key = findSecret(url.searchParams.get(LOGIN_PARAMETER), loginKeys);
    url.searchParams.delete(LOGIN_PARAMETER);
    const location = `${url.pathname}${url.search}`;
    if (key) {
      loginKeys.delete(key);
      const session = newSecret();
      sessions.add(session);
      response.writeHead(303, {
        location,
        'set-cookie': `${cookieName}=${session}; HttpOnly; SameSite=Strict; Path=/`,
        ...SECURITY_HEADERS,
      });
      response.end();
      options.onLogin?.();
      return;
    }
    if (hasSession) {
      // This browser is already logged in (an old address opened again): just drop the used key.
      response.writeHead(303, { location, ...SECURITY_HEADERS });
      response.end();
      return;
    }
    sendLoginNeeded(response, 403, 'This login address was already used or does not belong to this host.');
  };

  const handle = async (request: IncomingMessage, response: ServerResponse): Promise<void> => {
    if (!allowedHosts.has(request.headers.host ?? '')) {
      refuse(response, 421, 'forbidden', 'unexpected Host header');
      return;
    }
    const url = new URL(request.url ?? '/', 'http://127.0.0.1');
    const pathname = decodePath(url.pathname);
    if (pathname === null) {
      refuse(response, 400, 'invalid_input', 'the address has a malformed % escape');
      return;
    }
    const hasSession = findSecret(readCookie(request, cookieName), sessions) !== null;
    if (!pathname.startsWith('/api/')) {
      if (request.method !== 'GET' && request.method !== 'HEAD') {
        refuse(response, 405, 'forbidden', 'only GET for pages');
        return;
      }
      if (url.searchParams.has(LOGIN_PARAMETER)) {
        handleLogin(request, url, response, hasSession);
        return;
      }
      if (!hasSession) {
        sendLoginNeeded(response, 401, 'This browser is not logged in to this Pairwright host.');
        return;
      }
      serveStatic(pathname, response);
      return;
    }
    if (request.method !== 'POST') {
      refuse(response, 405, 'forbidden', 'API calls use POST');
      return;
    }
    const origin = request.headers.origin;
    if (origin !== undefined && !allowedOrigins.has(origin)) {
      refuse(response, 403, 'forbidden', 'calls from another origin are refused');
      return;
    }
    if (!hasSession || request.headers[CALL_HEADER] !== '1') {
      refuse(
        response,
        401,
        'forbidden',
        'not logged in; open the address printed in the terminal where the host was started',
      );
      return;
    }
    const operation = pathname.slice('/api/'.length);
    let input: unknown;
    try {
      const body = await readBody(request);
      if (jsonNestsDeeperThan(body, MAX_BODY_DEPTH)) {
        refuse(response, 400, 'invalid_input', `request body is nested deeper than ${MAX_BODY_DEPTH} levels`);
        return;
      }
      input = body.trim() === '' ? {} : JSON.parse(body);
    } catch (error) {
      if (error instanceof BodyTooLarge) {
        sendJson(
          response,
          413,
          {
            ok: false,
            error: { code: 'invalid_input', message: `request body larger than ${MAX_BODY_BYTES / 1024 / 1024} MB` },
          },
          { connection: 'close' },
        );
        return;
      }
      const message = error instanceof Error ? error.message : String(error);
      refuse(response, 400, 'invalid_input', `request body is not valid JSON: ${message}`);
      return;
    }
    const result: ApiResult<unknown> = await dispatch(options.context, operation, input);
    sendJson(response, result.ok ? 200 : (STATUS_BY_CODE[result.error.code] ?? 400), result);
  };

  const timeouts = options.timeouts ?? HOST_TIMEOUTS;
  const server = createServer({ connectionsCheckingInterval: timeouts.checkEveryMs }, (request, response) => {
    handle(request, response).catch((error: unknown) => {
      console.error('[pairwright host] request failed:', error);
      if (!response.headersSent) refuse(response, 500, 'internal', String(error));
      else response.destroy();
    });
  });
  server.headersTimeout = timeouts.headersMs;
  server.requestTimeout = timeouts.requestMs;

  return new Promise((resolvePromise, reject) => {
    server.once('error', reject);
    server.listen(options.port, '127.0.0.1', () => {
      port = (server.address() as AddressInfo).port;
      allowedHosts = new Set([`127.0.0.1:${port}`, `localhost:${port}`]);
      allowedOrigins = new Set([`http://127.0.0.1:${port}`, `http://localhost:${port}`]);
      cookieName = `pairwright_session_${port}`;
      resolvePromise({
        url: issueLoginUrl(),
        origin: `http://127.0.0.1:${port}`,
        port,
        cookieName,
        issueLoginUrl,
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

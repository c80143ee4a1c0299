/** Raw HTTP calls to the browser host for tests: any method, headers and body; logs in through a login address. */
import { request } from 'node:http';
import { CALL_HEADER, type RunningHost } from '../../electron/host/server';

export interface RawResponse {
  status: number;
  headers: Record<string, string | string[] | undefined>;
  body: string;
}

export interface RawRequest {
  method?: string;
  headers?: Record<string, string>;
  body?: string | Buffer;
}

export function send(port: number, path: string, options: RawRequest = {}): Promise<RawResponse> {
  return new Promise((resolve, reject) => {
    const headers = { host: `127.0.0.1:${port}`, ...options.headers };
    const req = request({ host: '127.0.0.1', port, path, method: options.method ?? 'GET', headers }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (chunk: Buffer) => chunks.push(chunk));
      res.on('end', () =>
        resolve({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks).toString('utf8') }),
      );
    });
    req.on('error', reject);
    if (options.body !== undefined) req.write(options.body);
    req.end();
  });
}

/** Opens a login address like a browser would and returns the `Cookie` header value of the new session. */
export async function logIn(host: RunningHost, loginUrl: string = host.issueLoginUrl()): Promise<string> {
  const url = new URL(loginUrl);
  const answer = await send(host.port, `${url.pathname}${url.search}`);
  const setCookie = answer.headers['set-cookie']?.[0];
  if (answer.status !== 303 || !setCookie) throw new Error(`login failed: HTTP ${answer.status} ${answer.body}`);
  return setCookie.split(';')[0] ?? '';
}

/** Headers of an API call from a logged-in page. */
export function apiHeaders(cookie: string): Record<string, string> {
  return { cookie, [CALL_HEADER]: '1', 'content-type': 'application/json' };
}

export async function callApi(
  host: RunningHost,
  cookie: string,
  operation: string,
  input: unknown,
): Promise<RawResponse> {
  return send(host.port, `/api/${operation}`, {
    method: 'POST',
    headers: apiHeaders(cookie),
    body: JSON.stringify(input),
  });
}

/**
 * The browser host under abusive clients: a body over the limit (declared or streamed without a length) gets a JSON
 * 413; a body nested 100,000 levels deep gets a clear 400 and no stack overflow; a client dribbling its headers or
 * its body is cut off after a bounded time while the host keeps answering others. Slow-loris: the attack of keeping
 * many connections open by sending a request a few bytes at a time (R. Hansen, 2009, "Slowloris HTTP DoS").
 * The host runs here with shortened slow-sender limits (2 s headers, 4 s request); the shipped figures are
 * HOST_TIMEOUTS (10 s, 60 s), checked below to be bounded.
 */
import { connect, type Socket } from 'node:net';
import { request } from 'node:http';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openStore, type Store } from '../../db/store';
import { rendererDistDir } from '../../electron/paths';
import {
  HOST_TIMEOUTS,
  jsonNestsDeeperThan,
  MAX_BODY_BYTES,
  MAX_BODY_DEPTH,
  startHost,
  type RunningHost,
} from '../../electron/host/server';
import { shutdownServices } from '../../electron/services/lifecycle';
import { tempDataDir } from '../support/host-fixture';
import { apiHeaders, callApi, logIn, send } from '../support/http-client';

const LIMITS = { headersMs: 2_000, requestMs: 4_000, checkEveryMs: 250 };
let host: RunningHost;
let store: Store;
let cookie: string;
beforeAll(async () => {
  store = openStore({ dataDir: tempDataDir() });
  host = await startHost({ context: { store }, rendererDir: rendererDistDir(), port: 0, timeouts: LIMITS });
  cookie = await logIn(host);
});
afterAll(async () => {
  await host.close();
  await shutdownServices(store);
});

/** Sends a body in chunks without a Content-Length (chunked transfer), resolving with the answer or the socket error. */
function streamBody(path: string, chunk: Buffer, chunks: number): Promise<{ status: number; body: string } | Error> {
  return new Promise((resolve) => {
    const req = request(
      {
        host: '127.0.0.1',
        port: host.port,
        path,
        method: 'POST',
        headers: { host: `127.0.0.1:${host.port}`, ...apiHeaders(cookie) },
      },
      (res) => {
        const parts: Buffer[] = [];
        res.on('data', (part: Buffer) => parts.push(part));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, body: Buffer.concat(parts).toString('utf8') }));
      },
    );
    req.on('error', (error) => resolve(error));
    let sent = 0;
    const writeMore = (): void => {
      while (sent < chunks) {
        sent++;
        if (!req.write(chunk)) {
          req.once('drain', writeMore);
          return;
        }
      }
      req.end();
    };
    writeMore();
  });
}

/** A raw socket that sends `text` one byte every `everyMs`; resolves with the time the host closed it. */
function dribble(text: string, everyMs: number): Promise<{ closedAfterMs: number; received: string }> {
  return new Promise((resolve) => {
    const started = Date.now();
    const socket: Socket = connect(host.port, '127.0.0.1');
    let received = '';
    let index = 0;
    const timer = setInterval(() => {
      if (index < text.length && !socket.destroyed) socket.write(text[index++] ?? '');
    }, everyMs);
    socket.on('data', (data: Buffer) => (received += data.toString('utf8')));
    socket.on('error', () => undefined);
    socket.on('close', () => {
      clearInterval(timer);
      resolve({ closedAfterMs: Date.now() - started, received });
    });
  });
}

describe('host body limits', () => {
  it('answers a streamed body over the limit (no Content-Length) with a JSON 413', async () => {
    const chunk = Buffer.alloc(1024 * 1024, 0x20);
    const answer = await streamBody('/api/campaigns.list', chunk, MAX_BODY_BYTES / chunk.length + 4);
    if (answer instanceof Error) throw answer;
    expect(answer.status).toBe(413);
    expect(JSON.parse(answer.body)).toEqual({
      ok: false,
      error: { code: 'invalid_input', message: 'request body larger than 20 MB' },
    });
  });

  it('answers a declared Content-Length over the limit with a JSON 413 before reading the body', async () => {
    const answer = await send(host.port, '/api/campaigns.list', {
      method: 'POST',
      headers: { ...apiHeaders(cookie), 'content-length': String(MAX_BODY_BYTES + 1) },
    });
    expect(answer.status).toBe(413);
    expect(JSON.parse(answer.body).error.message).toBe('request body larger than 20 MB');
  });

  it('answers bodies nested 100,000 levels deep with a clear 400, and keeps serving', async () => {
    const levels = 100_000;
    const bodies = [
      '['.repeat(levels) + ']'.repeat(levels),
      '{"name":'.repeat(levels) + '1' + '}'.repeat(levels),
      `{"name":"x","description":${'['.repeat(levels)}${']'.repeat(levels)}}`,
    ];
    for (const body of bodies) {
      const answer = await send(host.port, '/api/campaigns.create', {
        method: 'POST',
        headers: apiHeaders(cookie),
        body,
      });
      expect(answer.status).toBe(400);
      expect(JSON.parse(answer.body).error).toEqual({
        code: 'invalid_input',
        message: `request body is nested deeper than ${MAX_BODY_DEPTH} levels`,
      });
    }
    const after = await callApi(host, cookie, 'campaigns.list', {});
    expect(after.status).toBe(200);
    expect(JSON.parse(after.body)).toEqual({ ok: true, value: [] });
  });

  it('counts nesting outside strings only (brackets inside text are data)', () => {
    expect(jsonNestsDeeperThan(JSON.stringify({ name: '['.repeat(1000) }), MAX_BODY_DEPTH)).toBe(false);
    expect(jsonNestsDeeperThan(JSON.stringify({ name: '\\"[[[[' }), 2)).toBe(false);
    expect(jsonNestsDeeperThan('[[[]]]', 3)).toBe(false);
    expect(jsonNestsDeeperThan('[[[[]]]]', 3)).toBe(true);
  });
});

describe('host slow senders (slow-loris)', () => {
  it('ships bounded limits: headers within 10 s, the whole request within 60 s, checked every second', () => {
    expect(HOST_TIMEOUTS).toEqual({ headersMs: 10_000, requestMs: 60_000, checkEveryMs: 1_000 });
  });

  it('cuts off a client dribbling its headers, and answers another client meanwhile', async () => {
    const headers = `POST /api/campaigns.list HTTP/1.1\r\nHost: 127.0.0.1:${host.port}\r\nX-Padding: ${'a'.repeat(200)}\r\n`;
    const loris = [dribble(headers, 100), dribble(headers, 100), dribble(headers, 100)];
    await new Promise((r) => setTimeout(r, 500));
    const started = Date.now();
    const other = await callApi(host, cookie, 'campaigns.list', {});
    expect(other.status).toBe(200);
    expect(Date.now() - started).toBeLessThan(1_000);
    for (const cut of await Promise.all(loris)) {
      // headers timeout plus one check interval, with room for a busy machine
      expect(cut.closedAfterMs).toBeGreaterThanOrEqual(LIMITS.headersMs - 100);
      expect(cut.closedAfterMs).toBeLessThan(LIMITS.headersMs + LIMITS.checkEveryMs + 1_500);
    }
  });

  it('cuts off a client dribbling its body after the request limit', async () => {
    const head =
      `POST /api/campaigns.list HTTP/1.1\r\nHost: 127.0.0.1:${host.port}\r\nCookie: ${cookie}\r\n` +
      `X-Pairwright-Call: 1\r\nContent-Type: application/json\r\nContent-Length: 100000\r\n\r\n`;
    const cut = await new Promise<{ closedAfterMs: number; received: string }>((resolve) => {
      const started = Date.now();
      const socket = connect(host.port, '127.0.0.1', () => socket.write(head));
      let received = '';
      const timer = setInterval(() => !socket.destroyed && socket.write(' '), 100);
      socket.on('data', (data: Buffer) => (received += data.toString('utf8')));
      socket.on('error', () => undefined);
      socket.on('close', () => {
        clearInterval(timer);
        resolve({ closedAfterMs: Date.now() - started, received });
      });
    });
    expect(cut.closedAfterMs).toBeGreaterThanOrEqual(LIMITS.requestMs - 100);
    expect(cut.closedAfterMs).toBeLessThan(LIMITS.requestMs + LIMITS.checkEveryMs + 1_500);
    // Node answers a timed-out request with 408 before closing
    expect(cut.received).toMatch(/^HTTP\/1\.1 408/);
  });
});

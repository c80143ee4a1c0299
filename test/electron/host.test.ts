/** The browser host: token, Host header, 127.0.0.1 binding, errors as values, the page carries the token. */
import { request } from 'node:http';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TOKEN_HEADER } from '../../electron/host/server';
import { startTestHost, type HostFixture } from '../support/host-fixture';

let fixture: HostFixture;
beforeAll(async () => {
  fixture = await startTestHost();
});
afterAll(async () => fixture.stop());

function send(path: string, options: { method?: string; headers?: Record<string, string>; body?: string }): Promise<{ status: number; body: string }> {
  return new Promise((resolve, reject) => {
    const req = request({ host: '127.0.0.1', port: fixture.host.port, path, method: options.method ?? 'GET', headers: options.headers }, (res) => {
      let body = '';
      res.on('data', (chunk: Buffer) => (body += chunk.toString('utf8')));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, body }));
    });
    req.on('error', reject);
    if (options.body) req.write(options.body);
    req.end();
  });
}

const apiHeaders = () => ({ host: `127.0.0.1:${fixture.host.port}`, [TOKEN_HEADER]: fixture.host.token, 'content-type': 'application/json' });

describe('browser host', () => {
  it('listens on 127.0.0.1 only', () => {
    const address = fixture.host.server.address();
    expect(typeof address === 'object' && address?.address).toBe('127.0.0.1');
  });

  it('serves the page with this start’s token and a CSP', async () => {
    const page = await send('/', { headers: { host: `127.0.0.1:${fixture.host.port}` } });
    expect(page.status).toBe(200);
    expect(page.body).toContain(`<meta name="pairwright-token" content="${fixture.host.token}">`);
  });

  it('answers API calls that carry the token', async () => {
    const created = await send('/api/campaigns.create', { method: 'POST', headers: apiHeaders(), body: JSON.stringify({ name: 'Over HTTP' }) });
    expect(created.status).toBe(200);
    expect(JSON.parse(created.body)).toMatchObject({ ok: true, value: { name: 'Over HTTP' } });
  });

  it('refuses a missing or wrong token', async () => {
    const noToken = await send('/api/campaigns.list', { method: 'POST', headers: { host: `127.0.0.1:${fixture.host.port}` }, body: '{}' });
    expect(noToken.status).toBe(403);
    const wrong = await send('/api/campaigns.list', { method: 'POST', headers: { ...apiHeaders(), [TOKEN_HEADER]: 'f'.repeat(48) }, body: '{}' });
    expect(wrong.status).toBe(403);
  });

  it('refuses a foreign Host header (DNS rebinding)', async () => {
    const foreign = await send('/api/campaigns.list', { method: 'POST', headers: { ...apiHeaders(), host: `evil.example:${fixture.host.port}` }, body: '{}' });
    expect(foreign.status).toBe(421);
  });

  it('answers bad input and bad JSON as error values naming the field', async () => {
    const bad = await send('/api/campaigns.create', { method: 'POST', headers: apiHeaders(), body: JSON.stringify({ name: '' }) });
    expect(bad.status).toBe(400);
    expect(JSON.parse(bad.body)).toMatchObject({ ok: false, error: { code: 'invalid_input', field: 'name' } });
    const notJson = await send('/api/campaigns.create', { method: 'POST', headers: apiHeaders(), body: '{name:' });
    expect(notJson.status).toBe(400);
    expect(JSON.parse(notJson.body).error.message).toMatch(/not valid JSON/);
    const unknown = await send('/api/nothing.here', { method: 'POST', headers: apiHeaders(), body: '{}' });
    expect(unknown.status).toBe(404);
  });

  it('does not serve files outside the renderer build', async () => {
    const escape = await send('/..%2F..%2Fpackage.json', { headers: { host: `127.0.0.1:${fixture.host.port}` } });
    expect(escape.body).not.toContain('"name": "pairwright"');
  });
});

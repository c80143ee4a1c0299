/**
 * The browser host: one-time login address → HttpOnly SameSite=Strict session cookie; no key or session in any
 * answer to a request without a session; Host/Origin checks; 127.0.0.1 binding; errors as values.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CALL_HEADER, MAX_BODY_BYTES } from '../../electron/host/server';
import { startTestHost, type HostFixture } from '../support/host-fixture';
import { apiHeaders, callApi, logIn, send, type RawResponse } from '../support/http-client';

let fixture: HostFixture;
beforeAll(async () => {
  fixture = await startTestHost();
});
afterAll(async () => fixture.stop());

const port = () => fixture.host.port;
const loginPath = (url: string) => `${new URL(url).pathname}${new URL(url).search}`;
const keyOf = (url: string) => new URL(url).searchParams.get('login') ?? '';
const everything = (answer: RawResponse) => `${JSON.stringify(answer.headers)}\n${answer.body}`;

describe('browser host login', () => {
  it('listens on 127.0.0.1 only', () => {
    const address = fixture.host.server.address();
    expect(typeof address === 'object' && address?.address).toBe('127.0.0.1');
  });

  it('prints an address with a one-time key that becomes an HttpOnly, SameSite=Strict cookie', async () => {
    const url = fixture.host.issueLoginUrl('/#/campaigns');
    expect(url).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/\?login=[\w-]{43}#\/campaigns$/);
    const answer = await send(port(), loginPath(url));
    expect(answer.status).toBe(303);
    expect(answer.headers.location).toBe('/');
    const cookie = answer.headers['set-cookie']?.[0] ?? '';
    expect(cookie).toMatch(new RegExp(`^${fixture.host.cookieName}=[\\w-]{43}; HttpOnly; SameSite=Strict; Path=/$`));
    const page = await send(port(), '/', { headers: { cookie: cookie.split(';')[0] ?? '' } });
    expect(page.status).toBe(200);
    expect(page.body).toContain('<div id="root">');
    expect(page.headers['content-security-policy']).toContain("default-src 'self'");
  });

  it('refuses a login key the second time', async () => {
    const url = fixture.host.issueLoginUrl();
    await logIn(fixture.host, url);
    const again = await send(port(), loginPath(url));
    expect(again.status).toBe(403);
    expect(again.headers['set-cookie']).toBeUndefined();
    expect(again.body).toContain('already used');
  });

  it('never sends a key, a session or the app to a request without a session', async () => {
    const pending = fixture.host.issueLoginUrl();
    const cookie = await logIn(fixture.host);
    const session = cookie.split('=')[1] ?? '';
    const answers = await Promise.all([
      send(port(), '/'),
      send(port(), '/index.html'),
      send(port(), '/?login=' + 'A'.repeat(43)),
      send(port(), '/api/campaigns.list', { method: 'POST', headers: { [CALL_HEADER]: '1' }, body: '{}' }),
      send(port(), '/api/campaigns.list', { method: 'GET' }),
      send(port(), '/assets/', { method: 'HEAD' }),
    ]);
    for (const answer of answers) {
      expect([401, 403, 405]).toContain(answer.status);
      expect(everything(answer)).not.toContain(keyOf(pending));
      expect(everything(answer)).not.toContain(session);
      expect(answer.body).not.toContain('<div id="root">');
      expect(answer.headers['set-cookie']).toBeUndefined();
    }
    // The pending key still works afterwards: refusals do not consume or reveal it.
    expect(await logIn(fixture.host, pending)).toMatch(/=/);
  });

  it('answers API calls from a logged-in page', async () => {
    const cookie = await logIn(fixture.host);
    const created = await callApi(fixture.host, cookie, 'campaigns.create', { name: 'Over HTTP' });
    expect(created.status).toBe(200);
    expect(JSON.parse(created.body)).toMatchObject({ ok: true, value: { name: 'Over HTTP' } });
  });

  it('refuses API calls without the cookie, with a wrong one, without the call header or from another origin', async () => {
    const cookie = await logIn(fixture.host);
    const list = (headers: Record<string, string>) =>
      send(port(), '/api/campaigns.list', { method: 'POST', headers, body: '{}' });
    expect((await list({ [CALL_HEADER]: '1' })).status).toBe(401);
    expect((await list(apiHeaders(`${fixture.host.cookieName}=${'x'.repeat(43)}`))).status).toBe(401);
    expect((await list({ cookie, 'content-type': 'application/json' })).status).toBe(401);
    expect((await list({ ...apiHeaders(cookie), origin: 'http://127.0.0.1:1' })).status).toBe(403);
    expect((await list({ ...apiHeaders(cookie), origin: 'null' })).status).toBe(403);
    expect((await list({ ...apiHeaders(cookie), origin: fixture.host.origin })).status).toBe(200);
    expect(
      (await send(port(), '/api/campaigns.list', { method: 'OPTIONS', headers: { origin: 'http://evil.example' } }))
        .status,
    ).toBe(405);
  });

  it('refuses a foreign Host header (DNS rebinding)', async () => {
    const cookie = await logIn(fixture.host);
    const headers = { ...apiHeaders(cookie), host: `evil.example:${port()}` };
    const foreign = await send(port(), '/api/campaigns.list', { method: 'POST', headers, body: '{}' });
    expect(foreign.status).toBe(421);
    const login = await send(port(), loginPath(fixture.host.issueLoginUrl()), {
      headers: { host: `evil.example:${port()}` },
    });
    expect(login.status).toBe(421);
  });
});

describe('browser host requests', () => {
  it('answers bad input and bad JSON as error values naming the field', async () => {
    const cookie = await logIn(fixture.host);
    const bad = await callApi(fixture.host, cookie, 'campaigns.create', { name: '' });
    expect(bad.status).toBe(400);
    expect(JSON.parse(bad.body)).toMatchObject({ ok: false, error: { code: 'invalid_input', field: 'name' } });
    const notJson = await send(port(), '/api/campaigns.create', {
      method: 'POST',
      headers: apiHeaders(cookie),
      body: '{name:',
    });
    expect(notJson.status).toBe(400);
    expect(JSON.parse(notJson.body).error.message).toMatch(/not valid JSON/);
    const unknown = await callApi(fixture.host, cookie, 'nothing.here', {});
    expect(unknown.status).toBe(404);
  });

  it('answers a malformed % escape with 400, not 500', async () => {
    const cookie = await logIn(fixture.host);
    const api = await send(port(), '/api/campaigns.%E0%A4%A', {
      method: 'POST',
      headers: apiHeaders(cookie),
      body: '{}',
    });
    expect(api.status).toBe(400);
    expect(JSON.parse(api.body).error.message).toMatch(/malformed % escape/);
    const page = await send(port(), '/%', { headers: { cookie } });
    expect(page.status).toBe(400);
  });

  it('answers a body over the limit with a JSON 413', async () => {
    const cookie = await logIn(fixture.host);
    const body = Buffer.alloc(MAX_BODY_BYTES + 1024, 0x20);
    const answer = await send(port(), '/api/campaigns.list', { method: 'POST', headers: apiHeaders(cookie), body });
    expect(answer.status).toBe(413);
    expect(JSON.parse(answer.body).error.message).toMatch(/larger than 20 MB/);
  });

  it('does not serve files outside the renderer build (encoded variants)', async () => {
    const cookie = await logIn(fixture.host);
    const attempts = [
      '/..%2F..%2Fpackage.json',
      '/%2e%2e/%2e%2e/package.json',
      '/..%5c..%5cpackage.json',
      '/%252e%252e/package.json',
    ];
    for (const path of attempts) {
      const answer = await send(port(), path, { headers: { cookie } });
      expect(answer.body).not.toContain('"name": "pairwright"');
    }
  });
});

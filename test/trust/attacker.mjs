/* global process, console */
// A hostile program run as ANOTHER local account (see second-user.test.ts): it knows the host's port and
// data folder and tries to get in. Plain Node, no imports from the project (it runs from a copy in /tmp).
// Prints one JSON line: { attempts, refused, accepted: [descriptions of anything that got through] }.
import { readdirSync, readFileSync } from 'node:fs';
import { request } from 'node:http';
import { join } from 'node:path';

const [port, dataDir] = process.argv.slice(2);
const accepted = [];
let attempts = 0;

function send(path, { method = 'GET', headers = {}, body } = {}) {
  return new Promise((resolve) => {
    const req = request(
      { host: '127.0.0.1', port: Number(port), path, method, headers: { host: `127.0.0.1:${port}`, ...headers } },
      (res) => {
        let text = '';
        res.on('data', (chunk) => (text += chunk));
        res.on('end', () => resolve({ status: res.statusCode, headers: res.headers, body: text }));
      },
    );
    req.on('error', (error) => resolve({ status: 0, headers: {}, body: String(error) }));
    if (body !== undefined) req.write(body);
    req.end();
  });
}

const secretLike = /login=[\w-]{20,}|pairwright_session_\d+=[\w-]{20,}|pairwright-token/;

async function tryHttp(description, path, options) {
  attempts += 1;
  const answer = await send(path, options);
  const leaked = secretLike.test(answer.body) || secretLike.test(JSON.stringify(answer.headers));
  const gotIn = answer.status === 200 || answer.status === 303 || answer.body.includes('<div id="root">') || leaked;
  if (gotIn) accepted.push(`${description}: HTTP ${answer.status}${leaked ? ' (secret in answer)' : ''}`);
  return answer;
}

function tryFile(description, action) {
  attempts += 1;
  try {
    action();
    accepted.push(`${description}: allowed`);
  } catch (error) {
    if (error.code !== 'EACCES' && error.code !== 'EPERM') accepted.push(`${description}: unexpected ${error.code}`);
  }
}

const call = { 'x-pairwright-call': '1', 'content-type': 'application/json' };
const random = () => Math.random().toString(36).slice(2).padEnd(43, 'A');
await tryHttp('page', '/');
await tryHttp('index.html', '/index.html');
await tryHttp('guessed login key', `/?login=${random()}`);
await tryHttp('empty login key', '/?login=');
for (const operation of ['campaigns.list', 'campaigns.create', 'batches.remove', 'pairs.list']) {
  await tryHttp(`${operation} without a session`, `/api/${operation}`, {
    method: 'POST',
    headers: call,
    body: '{"name":"x","id":1}',
  });
  await tryHttp(`${operation} with a guessed session`, `/api/${operation}`, {
    method: 'POST',
    headers: { ...call, cookie: `pairwright_session_${port}=${random()}` },
    body: '{"name":"x","id":1}',
  });
}
await tryHttp('old token header', '/api/campaigns.list', {
  method: 'POST',
  headers: { ...call, 'x-pairwright-token': random() },
  body: '{}',
});
await tryHttp('traversal', '/..%2F..%2F..%2Fetc%2Fpasswd');
await tryFile('list the data folder', () => readdirSync(dataDir));
await tryFile('read the store', () => readFileSync(join(dataDir, 'pairwright.sqlite')));
await tryFile('read the WAL', () => readFileSync(join(dataDir, 'pairwright.sqlite-wal')));
await tryFile('list backups', () => readdirSync(join(dataDir, 'backups')));

console.log(JSON.stringify({ attempts, refused: attempts - accepted.length, accepted }));

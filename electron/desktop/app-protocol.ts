/**
 * The window loads the renderer from `app://pairwright/…`, a privileged scheme of our own, instead of
 * `file://`: the page's Content-Security-Policy `'self'` then means the app's own files only (not every file
 * on the disk), and the IPC sender check has one exact origin to compare with. The handler serves files from
 * the built renderer folder and nothing else: no path may leave it, encoded or not.
 */
import { readFile } from 'node:fs/promises';
import { extname, join, relative, resolve, sep } from 'node:path';

export const APP_SCHEME = 'app';
export const APP_HOST = 'pairwright';
export const APP_ORIGIN = `${APP_SCHEME}://${APP_HOST}`;
export const APP_INDEX_URL = `${APP_ORIGIN}/index.html`;

/** The scheme's privileges, registered before the app is ready (Electron's protocol.registerSchemesAsPrivileged). */
export const APP_SCHEME_PRIVILEGES = { standard: true, secure: true, supportFetchAPI: true } as const;

const CONTENT_TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.ico': 'image/x-icon',
  '.woff2': 'font/woff2',
  '.json': 'application/json',
  '.csv': 'text/csv; charset=utf-8',
};

/** True when `url` is one of the app's own pages (the only origin the window may show). */
export function isAppUrl(url: string): boolean {
  try {
    const parsed = new URL(url);
    return parsed.protocol === `${APP_SCHEME}:` && parsed.host === APP_HOST;
  } catch {
    return false;
  }
}

/**
 * The file under `rendererDir` that an app:// URL names, or null when the URL is not ours, does not decode,
 * or would leave the folder (`..`, encoded `%2e%2e`, encoded separators, NUL).
 */
export function appUrlToFile(rendererDir: string, url: string): string | null {
  if (!isAppUrl(url)) return null;
  let pathname: string;
  try {
    pathname = decodeURIComponent(new URL(url).pathname);
  } catch {
    return null;
  }
  if (pathname.includes('\0') || pathname.includes('\\')) return null;
  const root = resolve(rendererDir);
  const file = resolve(join(root, pathname === '/' ? '/index.html' : pathname));
  const inside = relative(root, file);
  if (inside === '' || inside.startsWith('..') || inside.split(sep).includes('..')) return null;
  return file;
}

/** Electron's protocol.handle callback for app://: the file with its content type, or 404. */
export function appProtocolHandler(rendererDir: string): (request: Request) => Promise<Response> {
  return async (request) => {
    const file = appUrlToFile(rendererDir, request.url);
    if (file === null) return new Response('Not found', { status: 404 });
    try {
      const body = await readFile(file);
      return new Response(body, {
        status: 200,
        headers: { 'content-type': CONTENT_TYPES[extname(file).toLowerCase()] ?? 'application/octet-stream' },
      });
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ENOENT') return new Response('Not found', { status: 404 });
      throw error;
    }
  };
}

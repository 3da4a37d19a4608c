/**
 * A minimal static file server for the built handbook: tests, the `dampbook sheet` command and
 * anyone without a web server use it. Serves `root` under `base` on 127.0.0.1, directory
 * requests get index.html, unknown paths 404; nothing outside the root is served (the decoded path
 * is resolved and must stay inside it) and a bad escape is a 400. No dependencies, no writes.
 */
import { createReadStream, existsSync, statSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import { extname, join, resolve, sep } from 'node:path';

const TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8', '.js': 'text/javascript; charset=utf-8', '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8', '.svg': 'image/svg+xml', '.json': 'application/json', '.woff2': 'font/woff2',
  '.woff': 'font/woff', '.ttf': 'font/ttf', '.wasm': 'application/wasm', '.png': 'image/png', '.txt': 'text/plain',
};

/** True when `file` is `top` itself or inside it (a sibling such as `top-private` is not). */
function inside(top: string, file: string): boolean {
  return file === top || file.startsWith(top.endsWith(sep) ? top : top + sep);
}

/**
 * The file a request path names, or 400 (a bad %-escape, a NUL, an encoded separator) or 404
 * (outside the base or the root, or missing). The decoded path is resolved and must stay inside
 * the root.
 */
export function fileFor(top: string, prefix: string, url: string): string | 400 | 404 {
  const raw = url.split('?')[0]!.split('#')[0]!;
  let path: string;
  try { path = decodeURIComponent(raw); } catch { return 400; }
  // a separator or NUL smuggled in as an escape is never a real file name here
  if (path.includes('\0') || /%(2f|5c)/i.test(raw)) return 400;
  if (!path.startsWith(prefix)) return 404;
  let file = resolve(top, `.${sep}${path.slice(prefix.length)}`);
  if (!inside(top, file)) return 404;
  if (existsSync(file) && statSync(file).isDirectory()) file = join(file, 'index.html');
  return existsSync(file) && statSync(file).isFile() ? file : 404;
}

function notFound(top: string, res: import('node:http').ServerResponse): void {
  const nf = join(top, '404.html');
  res.writeHead(404, { 'content-type': TYPES['.html']! });
  if (existsSync(nf)) createReadStream(nf).on('error', () => res.destroy()).pipe(res); else res.end('not found');
}

export interface Served { readonly server: Server; readonly origin: string; readonly url: string; close(): Promise<void> }

export async function serveStatic(root: string, base = '/', port = 0): Promise<Served> {
  const top = resolve(root);
  const prefix = base.endsWith('/') ? base : `${base}/`;
  const server = createServer((req, res) => {
    try {
      const file = fileFor(top, prefix, req.url ?? '/');
      if (file === 400) { res.writeHead(400).end('bad request'); return; }
      if (file === 404) { notFound(top, res); return; }
      res.writeHead(200, { 'content-type': TYPES[extname(file)] ?? 'application/octet-stream', 'cache-control': 'no-cache' });
      createReadStream(file).on('error', () => res.destroy()).pipe(res);
    } catch {
      if (!res.headersSent) res.writeHead(500).end(); else res.destroy();
    }
  });
  await new Promise<void>((ok) => server.listen(port, '127.0.0.1', ok));
  const addr = server.address();
  const p = typeof addr === 'object' && addr ? addr.port : port;
  const origin = `http://127.0.0.1:${p}`;
  return { server, origin, url: `${origin}${prefix}`, close: () => new Promise((ok) => server.close(() => ok())) };
}

/**
 * A minimal static file server for the built handbook: tests, the `dampbook sheet` command and
 * anyone without a web server use it. Serves `root` under `base` on 127.0.0.1, directory
 * requests get index.html, unknown paths 404. No dependencies, no writes.
 */
import { createReadStream, existsSync, statSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import { extname, join, normalize, resolve } from 'node:path';

const TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8', '.js': 'text/javascript; charset=utf-8', '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8', '.svg': 'image/svg+xml', '.json': 'application/json', '.woff2': 'font/woff2',
  '.woff': 'font/woff', '.ttf': 'font/ttf', '.wasm': 'application/wasm', '.png': 'image/png', '.txt': 'text/plain',
};

export interface Served { readonly server: Server; readonly origin: string; readonly url: string; close(): Promise<void> }

export async function serveStatic(root: string, base = '/', port = 0): Promise<Served> {
  const top = resolve(root);
  const prefix = base.endsWith('/') ? base : `${base}/`;
  const server = createServer((req, res) => {
    const path = decodeURIComponent((req.url ?? '/').split('?')[0]!.split('#')[0]!);
    if (!path.startsWith(prefix)) { res.writeHead(404).end('not found'); return; }
    let file = normalize(join(top, path.slice(prefix.length)));
    if (!file.startsWith(top)) { res.writeHead(403).end(); return; }
    if (existsSync(file) && statSync(file).isDirectory()) file = join(file, 'index.html');
    if (!existsSync(file)) {
      const nf = join(top, '404.html');
      res.writeHead(404, { 'content-type': TYPES['.html']! });
      if (existsSync(nf)) createReadStream(nf).pipe(res); else res.end('not found');
      return;
    }
    res.writeHead(200, { 'content-type': TYPES[extname(file)] ?? 'application/octet-stream', 'cache-control': 'no-cache' });
    createReadStream(file).pipe(res);
  });
  await new Promise<void>((ok) => server.listen(port, '127.0.0.1', ok));
  const addr = server.address();
  const p = typeof addr === 'object' && addr ? addr.port : port;
  const origin = `http://127.0.0.1:${p}`;
  return { server, origin, url: `${origin}${prefix}`, close: () => new Promise((ok) => server.close(() => ok())) };
}

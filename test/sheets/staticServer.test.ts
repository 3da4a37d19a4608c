/**
 * The project's static server (tests, `dampbook sheet`): serves only files inside its root (no
 * sibling-folder traversal with encoded dots or separators), answers a bad escape or a NUL with
 * 400 and keeps running. No reference values (behaviour).
 */
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { request } from 'node:http';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { serveStatic, type Served } from '../../src/server/staticServer.ts';

const tmp = mkdtempSync(join(tmpdir(), 'dampbook-srv-'));
let served: Served;
let sub: Served;

/** A raw GET: the path is sent exactly as written (fetch() would normalise %2e%2e away). */
function get(s: Served, path: string): Promise<{ status: number; body: string }> {
  return new Promise((ok, fail) => {
    const req = request({ host: '127.0.0.1', port: Number(new URL(s.origin).port), path, method: 'GET' }, (res) => {
      let body = '';
      res.setEncoding('utf8');
      res.on('data', (c: string) => { body += c; });
      res.on('end', () => ok({ status: res.statusCode ?? 0, body }));
    });
    req.on('error', fail);
    req.end();
  });
}

beforeAll(async () => {
  mkdirSync(join(tmp, 'dist', 'a'), { recursive: true });
  mkdirSync(join(tmp, 'dist-private'));
  writeFileSync(join(tmp, 'dist', 'index.html'), '<p>home</p>');
  writeFileSync(join(tmp, 'dist', 'a', 'index.html'), '<p>page a</p>');
  writeFileSync(join(tmp, 'dist-private', 'secret.txt'), 'TOP-SECRET');
  served = await serveStatic(join(tmp, 'dist'), '/');
  sub = await serveStatic(join(tmp, 'dist'), '/handbook/');
});
afterAll(async () => {
  await served?.close();
  await sub?.close();
  rmSync(tmp, { recursive: true, force: true });
});

describe('static server', () => {
  it('serves pages inside its root', async () => {
    expect(await get(served, '/a/')).toEqual({ status: 200, body: '<p>page a</p>' });
    expect((await get(sub, '/handbook/a/')).body).toBe('<p>page a</p>');
  });

  it.each([
    '/%2e%2e/dist-private/secret.txt',
    '/%2E%2E/dist-private/secret.txt',
    '/..%2fdist-private%2fsecret.txt',
    '/a/%2e%2e/%2e%2e/dist-private/secret.txt',
    '/%2e%2e%5cdist-private%5csecret.txt',
  ])('does not serve a sibling folder for %s', async (path) => {
    const r = await get(served, path);
    expect(r.status).toBeGreaterThanOrEqual(400);
    expect(r.body).not.toContain('TOP-SECRET');
  });

  it('does not serve a sibling folder under a base path', async () => {
    const r = await get(sub, '/handbook/%2e%2e/dist-private/secret.txt');
    expect(r.body).not.toContain('TOP-SECRET');
  });

  it.each(['/%E0%A4%A', '/%', '/a%00/index.html'])('answers %s with 400 and keeps running', async (path) => {
    expect((await get(served, path)).status).toBe(400);
    expect((await get(served, '/a/')).status).toBe(200);
  });
});

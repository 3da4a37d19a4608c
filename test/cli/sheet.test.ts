/**
 * `dampbook sheet` refuses, before any browser starts, what `calc` refuses (the same one-line
 * message): an invalid choice, a missing required input, an over-long value, a text file that is
 * not a record; and it ends with a clear one-line message when Chromium cannot start, when the
 * site was built for another base, or when the base is not a path. Uses a two-page stand-in site
 * (only the page markers `sheet` reads), so no build is needed. No reference values (behaviour).
 */
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, afterEach, describe, expect, it, vi } from 'vitest';
import { main } from '../../src/cli/main.ts';

const tmp = mkdtempSync(join(tmpdir(), 'dampbook-sheetcli-'));
afterAll(() => rmSync(tmp, { recursive: true, force: true }));
afterEach(() => vi.unstubAllEnvs());

function site(name: string, base: string): string {
  const dir = join(tmp, name);
  for (const [path, id, calc] of [['damper-laws/energy-per-cycle', 'energy-per-cycle', 'energy-per-cycle'], ['oscillators/sdof', 'sdof', 'sdof'], ['damping-tests/ring-down', 'ring-down', 'ring-down']] as const) {
    mkdirSync(join(dir, path), { recursive: true });
    writeFileSync(join(dir, path, 'index.html'), `<!DOCTYPE html><html><body data-page-id="${id}"><main data-page-id="${id}"><db-calculator class="calc" data-calc="${calc}" id="c-${calc}"></db-calculator></main><script type="module" src="${base}_db/calculator-element.X.js"></script></body></html>`);
  }
  writeFileSync(join(dir, 'index.html'), '<!DOCTYPE html><html><body>home</body></html>');
  return dir;
}

const root = site('root', '/');
const sub = site('sub', '/handbook/');

async function run(...argv: string[]): Promise<{ code: number; out: string; err: string }> {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(argv, (s) => out.push(s), (s) => err.push(s));
  return { code, out: out.join('\n'), err: err.join('\n') };
}

const pdf = join(tmp, 'x.pdf');

describe('sheet refuses what calc refuses, with calc\'s message', () => {
  it.each([
    ['energy-per-cycle', ['law=Power', 'c=1500']],
    ['sdof', ['c=80']],
    ['sdof', ['m=10', 'k=4000', `c=${'4'.repeat(150)}x`]],
    ['sdof', ['m=1\n0', 'k=4000', 'c=40']],
  ])('%s %j', async (id, ins) => {
    const inArgs = ins.flatMap((kv) => ['--in', kv]);
    const c = await run('calc', id, ...inArgs);
    const s = await run('sheet', id, ...inArgs, '--site', root, '--pdf', pdf);
    expect(c.code).not.toBe(0);
    expect(s.code).toBe(c.code);
    expect(s.err).toBe(c.err);
    expect(s.err.split('\n')).toHaveLength(1);
  });

  it('reads @file like calc and never echoes it', async () => {
    const secret = join(tmp, 'shadow');
    writeFileSync(secret, 'root:$6$SECRETHASHxyz:19000:0:99999:7:::\n');
    const s = await run('sheet', 'ring-down', '--in', `record=@${secret}`, '--site', root, '--pdf', pdf);
    expect(s.code).toBe(1);
    expect(s.err).toMatch(/'record'/);
    expect(s.err).not.toMatch(/SECRET|root:/);
    const z = await run('sheet', 'ring-down', '--in', 'record=@/dev/zero', '--site', root, '--pdf', pdf);
    expect(z.err).toMatch(/not a regular file/);
  });

  it('refuses an input the page does not have', async () => {
    const s = await run('sheet', 'sdof', '--in', 'mass=3', '--site', root, '--pdf', pdf);
    expect(s.code).toBe(1);
    expect(s.err).toMatch(/no input 'mass'/);
  });
});

describe('sheet ends clearly when it cannot print', () => {
  const ok = ['--in', 'm=10', '--in', 'k=4000', '--in', 'c=40'];

  it('says so when Chromium cannot start, and does not hang', async () => {
    vi.stubEnv('DAMPBOOK_CHROMIUM', '/bin/false');
    const t = Date.now();
    const s = await run('sheet', 'sdof', ...ok, '--site', root, '--pdf', pdf);
    expect(s.code).toBe(1);
    expect(s.err).toMatch(/^dampbook: Chromium at \/bin\/false could not start/);
    expect(s.err.split('\n')).toHaveLength(1);
    expect(Date.now() - t).toBeLessThan(30_000);
  }, 60_000);

  it('says the base does not match a site built for another base', async () => {
    const s = await run('sheet', 'sdof', ...ok, '--site', sub, '--pdf', pdf);
    expect(s.code).toBe(1);
    expect(s.err).toMatch(/built for the base \/handbook\/, not \/: give --base \/handbook\//);
  });

  it.each(['/%E0%A4%A/', '/../', 'handbook', '/a b/'])('refuses --base %j with one line', async (base) => {
    const s = await run('sheet', 'sdof', ...ok, '--site', root, '--base', base, '--pdf', pdf);
    expect(s.code).toBe(1);
    expect(s.err.split('\n')).toHaveLength(1);
    expect(s.err).toMatch(/--base .*give the path the site was built for/);
  });
});

describe('sheet through the real bin', () => {
  it('exits with one line, not a hang, when Chromium cannot start (DAMPBOOK_CHROMIUM=/bin/false)', async () => {
    const { spawnSync } = await import('node:child_process');
    const r = spawnSync('node', ['bin/dampbook.mjs', 'sheet', 'sdof', '--in', 'm=10', '--in', 'k=4000', '--in', 'c=40', '--site', root, '--pdf', pdf], { encoding: 'utf8', timeout: 40_000, env: { ...process.env, DAMPBOOK_CHROMIUM: '/bin/false', DAMPBOOK_DEBUG: '' } });
    expect(r.status, r.stderr).toBe(1);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toMatch(/could not start/);
  }, 60_000);
});

/**
 * `check` and `new` on awkward folders and arguments: a dangling symlink or a symlink loop is
 * reported and the other pages are still checked; a page saved with a UTF-8 byte-order mark
 * checks as it builds; `new` refuses a slug or title that would scaffold a page failing `check`.
 * No reference values (behaviour; the verification cases are the demo pages' own).
 */
import { copyFileSync, cpSync, mkdirSync, mkdtempSync, readFileSync, rmSync, symlinkSync, writeFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main.ts';

const tmp = mkdtempSync(join(tmpdir(), 'dampbook-robust-'));
afterAll(() => rmSync(tmp, { recursive: true, force: true }));

async function run(...argv: string[]): Promise<{ code: number; out: string; err: string }> {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(argv, (s) => out.push(s), (s) => err.push(s));
  return { code, out: out.join('\n'), err: err.join('\n') };
}

function copy(name: string): string {
  const dir = join(tmp, name);
  cpSync('content', dir, { recursive: true });
  return dir;
}

describe('check on awkward folders', () => {
  it('reports a dangling symlink and checks every other page', async () => {
    const dir = copy('dangling');
    symlinkSync(join(tmp, 'nowhere.mdx'), join(dir, 'oscillators', 'gone.mdx'));
    const r = await run('check', '--content', dir);
    expect(r.err).toBe('');
    expect(r.code).toBe(1);
    expect(r.out).toMatch(/FAIL .*gone\.mdx: .*(dangling|no such file)/);
    expect(r.out).toMatch(/ok {3}.*oscillators\/sdof\.mdx: sdof rev B approved/);
  });

  it('reports a symlink loop and a link back to a parent folder, and checks the rest', async () => {
    const dir = copy('loop');
    symlinkSync('self.mdx', join(dir, 'oscillators', 'self.mdx'));
    symlinkSync('..', join(dir, 'oscillators', 'up'));
    const r = await run('check', '--content', dir);
    expect(r.err).toBe('');
    expect(r.out).toMatch(/FAIL .*self\.mdx: .*loop/);
    expect(r.out).toMatch(/ok {3}.*oscillators\/sdof\.mdx: sdof rev B approved/);
    expect(r.out.match(/oscillators\/sdof\.mdx/g)).toHaveLength(1);
  });

  it('reports a page name that is a FIFO or a device instead of blocking on it', async () => {
    const dir = copy('fifo');
    const { execFileSync } = await import('node:child_process');
    execFileSync('mkfifo', [join(dir, 'oscillators', 'pipe.mdx')]);
    symlinkSync('/dev/zero', join(dir, 'oscillators', 'zero.mdx'));
    const r = await run('check', '--content', dir);
    expect(r.err).toBe('');
    expect(r.out).toMatch(/FAIL .*pipe\.mdx: .*not a regular file/);
    expect(r.out).toMatch(/FAIL .*zero\.mdx: .*not a regular file/);
    expect(r.out).toMatch(/ok {3}.*oscillators\/sdof\.mdx: sdof rev B approved/);
  }, 20_000);

  it('checks a page saved with a UTF-8 byte-order mark as the build reads it', async () => {
    const dir = copy('bom');
    const f = join(dir, 'oscillators', 'sdof.mdx');
    writeFileSync(f, `\uFEFF${readFileSync(f, 'utf8')}`);
    const r = await run('check', '--content', dir);
    expect(r.out).toMatch(/ok {3}.*oscillators\/sdof\.mdx: sdof rev B approved/);
    expect(r.code).toBe(0);
  });
});

/** An empty handbook folder with the demo's settings and topics (a folder needs its handbook.config.json). */
function handbookFolder(name: string): string {
  const dir = join(tmp, name);
  mkdirSync(dir, { recursive: true });
  copyFileSync('content/handbook.config.json', join(dir, 'handbook.config.json'));
  return dir;
}

describe('new refuses what check would fail', () => {
  it.each([
    [['new', 'thermal/sb'], /title/],
    [['new', 'thermal/fin-cooling', '--title', ''], /title/],
    [['new', 'thermal/fin-cooling', '--title', 'ab'], /title/],
  ])('%j exits non-zero and writes nothing', async (argv) => {
    const dir = handbookFolder(`new-${Math.random().toString(36).slice(2)}`);
    const r = await run(...argv, '--content', dir);
    expect(r.code).not.toBe(0);
    expect(r.err).toMatch(/title/);
    expect(existsSync(join(dir, 'thermal'))).toBe(false);
  });

  it('a scaffolded page passes check', async () => {
    const dir = handbookFolder('new-ok');
    expect((await run('new', 'thermal/fin-cooling', '--by', 'Lucia Penhale', '--content', dir)).code).toBe(0);
    const r = await run('check', '--content', dir);
    expect(r.out).toMatch(/ok {3}.*fin-cooling\.mdx/);
  });
});

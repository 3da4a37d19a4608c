/**
 * `dampbook check`, `new` and `calc --record` against temporary content folders: a broken
 * verification value or frontmatter field fails with the page, case, expected and computed values.
 */
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main.ts';

async function run(...argv: string[]): Promise<{ code: number; out: string; err: string }> {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(argv, (s) => out.push(s), (s) => err.push(s));
  return { code, out: out.join('\n'), err: err.join('\n') };
}

const tmp = mkdtempSync(join(tmpdir(), 'dampbook-check-'));
afterAll(() => rmSync(tmp, { recursive: true, force: true }));

/** A copy of the demo content with one edit to the oscillator page. */
function fixture(name: string, edit: (text: string) => string): string {
  const dir = join(tmp, name);
  cpSync('content', dir, { recursive: true });
  const f = join(dir, 'oscillators/sdof.mdx');
  writeFileSync(f, edit(readFileSync(f, 'utf8')));
  return dir;
}

describe('dampbook check', () => {
  it('passes the demo handbook and counts its checks', async () => {
    const r = await run('check');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/ok {3}content\/oscillators\/sdof\.mdx: sdof rev B approved/);
    expect(r.out).toMatch(/all pass/);
  });

  it('fails a broken verification value naming the page, the case, the expected and the computed value', async () => {
    // ζ = 40 / (2√(4000·10)) = 0.1 exactly (closed form); the fixture claims 0.15
    const dir = fixture('broken-value', (t) => t.replace('expected: { wn: 20, zeta: 0.1,', 'expected: { wn: 20, zeta: 0.15,'));
    const r = await run('check', '--content', dir);
    expect(r.code).toBe(1);
    const line = r.out.split('\n').find((l) => l.startsWith('FAIL'))!;
    expect(line).toContain('oscillators/sdof.mdx');
    expect(line).toContain("case 'Contract case — 10 kg on 4 kN/m with 40 N·s/m'");
    expect(line).toContain('zeta expected 0.15, computed 0.1');
  });

  it('fails a frontmatter error naming the file and the field', async () => {
    const dir = fixture('broken-field', (t) => t.replace('approvedBy: Ines Marrow\n', ''));
    const r = await run('check', '--content', dir);
    expect(r.code).toBe(1);
    expect(r.out).toMatch(/FAIL .*oscillators\/sdof\.mdx: approvedBy: an approved page needs approvedBy/);
  });

  it('scaffolds a draft page with `new` that passes check, and never overwrites', async () => {
    const dir = join(tmp, 'scaffold');
    cpSync('content', dir, { recursive: true });
    const made = await run('new', 'thermal/fin-check', '--content', dir, '--by', 'Lucia Penhale', '--calc', 'sdof');
    expect(made.code).toBe(0);
    const text = readFileSync(join(dir, 'thermal/fin-check.mdx'), 'utf8');
    expect(text).toContain('status: draft');
    expect(text).toContain('<Calculator id="sdof" />');
    const r = await run('check', '--content', dir);
    expect(r.out).toMatch(/ok {3}.*fin-check\.mdx: fin-check rev A draft/);
    expect(r.code).toBe(0);
    expect((await run('new', 'thermal/fin-check', '--content', dir)).code).toBe(2);
  });
});

describe('dampbook calc --record', () => {
  const record = {
    format: 'dampbook-record', formatVersion: 1, calculator: 'sdof', page: { id: 'sdof', revision: 'B' }, coreVersion: '0.1.0',
    time: '2026-11-30T10:00:00.000Z',
    inputs: { m: { value: 10, unit: 'kg' }, k: { value: 4000, unit: 'N/m' }, c: { value: 40, unit: 'N.s/m' }, x0: { value: 10, unit: 'mm' }, v0: { value: 0, unit: 'm/s' } },
    // closed forms (Rao, Mechanical Vibrations, 6th ed., §2.6): ωn = 20 rad/s, ζ = 0.1, Q = 5
    outputs: { wn: { value: 20, unit: 'rad/s' }, zeta: { value: 0.1 }, Q: { value: 5 }, regime: { value: 'underdamped' } },
  };
  const write = (name: string, data: unknown) => { const f = join(tmp, name); writeFileSync(f, typeof data === 'string' ? data : JSON.stringify(data)); return f; };

  it('reproduces a saved record', async () => {
    const r = await run('calc', '--record', write('ok.json', record), '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as { reproduced: boolean; matched: number; warnings: string[] };
    expect(j.reproduced).toBe(true);
    expect(j.matched).toBe(4);
  });

  it('reports a differing output and a page revision change', async () => {
    const r = await run('calc', '--record', write('diff.json', { ...record, page: { id: 'sdof', revision: 'A' }, outputs: { ...record.outputs, zeta: { value: 0.12 } } }));
    expect(r.code).toBe(1);
    expect(r.out).toMatch(/DIFFERS zeta: recorded 0\.12, computed 0\.1/);
    expect(r.out).toMatch(/revision A; this page is revision B/);
  });

  it('refuses a hostile record with one line', async () => {
    const r = await run('calc', '--record', write('bad.json', '{"__proto__": {"x": 1}, "format": "dampbook-record"}'));
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/forbidden key '__proto__'/);
    expect(r.err.split('\n')).toHaveLength(1);
  });
});

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
    // a page's own extra case: ζ = 40 / (2√(4000·20)) = 0.0707107 (closed form); the fixture claims 0.15
    const extra = `verification:\n  - name: Heavier mount — 20 kg on 4 kN/m with 40 N·s/m\n    calculator: sdof\n    inputs: { m: 20, k: 4000, c: 40 }\n    expected: { zeta: 0.15 }\n    tolerance: 1.0e-12\n    source: { key: rao2017, locator: '§2.6 closed forms' }\n    provenance: closed form\n`;
    const dir = fixture('broken-value', (t) => t.replace('calculators: [sdof]\n', `calculators: [sdof]\n${extra}`));
    const r = await run('check', '--content', dir);
    expect(r.code).toBe(1);
    const line = r.out.split('\n').find((l) => l.startsWith('FAIL'))!;
    expect(line).toContain('oscillators/sdof.mdx');
    expect(line).toContain("case 'Heavier mount — 20 kg on 4 kN/m with 40 N·s/m'");
    expect(line).toContain('zeta expected 0.15, computed 0.0707');
  });

  it("fails a page case that repeats its calculator's own case, naming both", async () => {
    const copy = `verification:\n  - name: Copied contract case\n    calculator: sdof\n    inputs: { m: 10, k: 4000, c: 40 }\n    expected: { zeta: 0.1 }\n    tolerance: 1.0e-12\n    source: { key: rao2017, locator: '§2.6 closed forms' }\n    provenance: closed form\n`;
    const dir = fixture('repeated-case', (t) => t.replace('calculators: [sdof]\n', `calculators: [sdof]\n${copy}`));
    const r = await run('check', '--content', dir);
    expect(r.code).toBe(1);
    expect(r.out).toMatch(/FAIL .*oscillators\/sdof\.mdx.*frontmatter case 'Copied contract case' repeats the case 'Issue contract case: 10 kg on 4 kN\/m with 40 N·s\/m' of calculator sdof/s);
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

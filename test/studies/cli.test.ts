/**
 * The study CLI contract: `study run --json` prints exactly {study, steps[{id, calculator, inputs,
 * outputs, from}], verdicts[{step, check, value, limit, pass}]}; `study check` prints nothing;
 * broken studies exit 1 with one line naming the step and input.
 * The numbers checked are the contract itself (keys, step ids, bindings equal to their source
 * outputs) and one unit conversion: 35 °C = 308.15 K (T/K = t/°C + 273.15, NIST SP 811 (2008),
 * Appendix B.9; published). No engineering value is asserted here (see test/studies/run.test.ts).
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main.ts';

const FILE = 'content/studies/tw-210-rear-damper-class-d.json';

async function cli(...argv: string[]) {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(argv, (s) => out.push(s), (s) => err.push(s));
  return { code, out: out.join('\n'), err };
}

function broken(edit: (s: Record<string, any>) => void): string {
  const s = JSON.parse(readFileSync(FILE, 'utf8'));
  edit(s);
  const f = join(mkdtempSync(join(tmpdir(), 'study-')), 'broken.json');
  writeFileSync(f, JSON.stringify(s));
  return f;
}

describe('dampbook study', () => {
  it('run --json summarises a step\'s text input (rows, characters, checksum) instead of echoing it', async () => {
    const profile = '# time [s], power [W]\n0, 120\n600, 0\n1200';
    const f = broken((s) => {
      const step = s.steps.find((x: { id: string }) => x.id === 'warm-up');
      step.inputs = { ...(step.inputs ?? {}), power: 'profile', profile };
    });
    const r = await cli('study', 'run', f, '--json');
    expect(r.code).toBe(0);
    const shown = JSON.parse(r.out).steps.find((x: { id: string }) => x.id === 'warm-up').inputs.profile;
    expect(shown).toMatch(/^text, 4 rows, \d+ characters, sha256 [0-9a-f]{12}$/);
    expect(r.out).not.toContain('600, 0');
  });

  it('run --json prints exactly the contract', async () => {
    const r = await cli('study', 'run', FILE, '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(Object.keys(j)).toEqual(['study', 'steps', 'verdicts']);
    expect(j.study).toMatch(/^TW-210 Fellrunner/);
    expect(j.steps.map((s: { id: string }) => s.id)).toEqual(['road', 'steady', 'warm-up', 'fade', 'rating']);
    for (const s of j.steps) expect(Object.keys(s)).toEqual(['id', 'calculator', 'inputs', 'outputs', 'from']);
    for (const v of j.verdicts) expect(Object.keys(v)).toEqual(['step', 'check', 'value', 'limit', 'pass']);
    const steady = j.steps[1];
    expect(steady.from.P).toBe('road.P');
    expect(steady.inputs.P).toBe(j.steps[0].outputs.P); // the binding holds exactly through JSON
    expect(steady.inputs.Tamb).toBeCloseTo(308.15, 10); // SI: 35 °C in kelvin
    expect(j.verdicts.find((v: { check: string }) => v.check === 'time-to-limit').value).toBe(j.steps[2].outputs.tLimit);
  });

  it('run without --json prints the steps and one PASS/FAIL line per verdict', async () => {
    const r = await cli('study', 'run', FILE);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/^FAIL steady steady-temperature: /m);
    expect(r.out).toMatch(/^PASS steady surroundings: /m);
  });

  it('check validates without printing', async () => {
    const r = await cli('study', 'check', FILE);
    expect(r).toEqual({ code: 0, out: '', err: [] });
  });

  it.each([
    ['missing input', (s: Record<string, any>) => { delete s.quantities.tyreRate; }, /^dampbook: study: step 'road' input 'kt': input 'kt' = missing \(required\)/],
    ['invalid input', (s: Record<string, any>) => { s.steps[1].inputs = { P: '-3 W' }; }, /^dampbook: study: step 'steady' input 'P': input 'P' = -3/],
    ['dangling binding', (s: Record<string, any>) => { s.steps[2].from = { UA: 'cooling.UA' }; }, /^dampbook: study: step 'warm-up' input 'UA': bound to cooling\.UA, but there is no step 'cooling'$/],
    ['hostile payload', (s: Record<string, any>) => { s.quantities = JSON.parse('{"__proto__": 1}'); }, /^dampbook: .*broken\.json: Not a valid study: it contains the forbidden key '__proto__'\.$/],
  ])('%s exits 1 with one line', async (_name, edit, message) => {
    const r = await cli('study', 'run', broken(edit), '--json');
    expect(r.code).toBe(1);
    expect(r.out).toBe('');
    expect(r.err).toHaveLength(1);
    expect(r.err[0]).toMatch(message);
  });

  it('through the real command: exit status 1 and one line on stderr', () => {
    const r = spawnSync('node', ['bin/dampbook.mjs', 'study', 'check', broken((s) => { s.steps[0].calculator = 'road'; })], { encoding: 'utf8' });
    expect(r.status).toBe(1);
    expect(r.stderr.trim().split('\n')).toEqual([`dampbook: study: step 'road': unknown calculator 'road'`]);
    expect(JSON.parse(execFileSync('node', ['bin/dampbook.mjs', 'study', 'run', 'content/studies/tw-118-end-stop.json', '--json'], { encoding: 'utf8' })).verdicts).toHaveLength(5);
  });
});

describe('a study file with a UTF-8 byte-order mark', () => {
  it('is read as without one by parseStudy (the build and the browser) and by study run', async () => {
    const { parseStudy } = await import('../../src/studies/schema.ts');
    const text = readFileSync('content/studies/tw-118-end-stop.json', 'utf8');
    const plain = parseStudy(text);
    const bom = parseStudy(`\uFEFF${text}`);
    expect(bom.ok, bom.ok ? '' : bom.message).toBe(true);
    expect(bom).toEqual(plain);
    const f = join(mkdtempSync(join(tmpdir(), 'dampbook-study-bom-')), 'bom.json');
    writeFileSync(f, `\uFEFF${text}`);
    const out: string[] = [];
    const a = await main(['study', 'run', f, '--json'], (s) => out.push(s), () => {});
    const b: string[] = [];
    await main(['study', 'run', 'content/studies/tw-118-end-stop.json', '--json'], (s) => b.push(s), () => {});
    expect(a).toBe(0);
    expect(out).toEqual(b);
  });
});

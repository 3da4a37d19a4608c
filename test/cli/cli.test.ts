/** The command line: contract outputs, errors naming the input, no stack traces. */
// Source of the numbers checked here: closed forms of Rao, Mechanical Vibrations, 6th ed., §2.6
// (ωn = √(k/m) = 20 rad/s, ζ = c/2√(km) = 0.1 for 10 kg, 4 kN/m, 40 N·s/m; provenance: closed form),
// and NIST SP 811 (2008) Appendix B.8 for the pound (published).
import { execFileSync, spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main.ts';

async function run(...argv: string[]): Promise<{ code: number; out: string; err: string }> {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(argv, (s) => out.push(s), (s) => err.push(s));
  return { code, out: out.join('\n'), err: err.join('\n') };
}

describe('dampbook calc sdof', () => {
  it('gives wn = 20, zeta = 0.1, underdamped for 10 kg, 4 kN/m, 40 N·s/m (closed form, Rao 6th ed. §2.6)', async () => {
    const r = await run('calc', 'sdof', '--in', 'm=10', '--in', 'k=4000', '--in', 'c=40', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as { id: string; outputs: Record<string, number | string> };
    expect(j.id).toBe('sdof');
    expect(j.outputs.wn).toBeCloseTo(20, 12);
    expect(j.outputs.zeta).toBeCloseTo(0.1, 12);
    expect(j.outputs.regime).toBe('underdamped');
  });

  it('exits non-zero naming m for a negative mass', async () => {
    const r = await run('calc', 'sdof', '--in', 'm=-1', '--in', 'k=4000', '--in', 'c=40', '--json');
    expect(r.code).not.toBe(0);
    expect(r.err).toMatch(/'m'/);
    expect(r.err).toMatch(/allowed/);
    expect(r.err.split('\n')).toHaveLength(1);
  });

  it('names a missing required input', async () => {
    const r = await run('calc', 'sdof', '--in', 'm=10', '--in', 'k=4000');
    expect(r.code).not.toBe(0);
    expect(r.err).toMatch(/'c'.*required/);
  });

  it('accepts unit-suffixed values', async () => {
    const r = await run('calc', 'sdof', '--in', 'm=22.0462262185 lb', '--in', 'k=4000', '--in', 'c=40', '--json');
    expect((JSON.parse(r.out) as { outputs: { wn: number } }).outputs.wn).toBeCloseTo(20, 8);
  });

  it('lists every calculator with key, kind and SI unit', async () => {
    const r = await run('list', '--json');
    const list = JSON.parse(r.out) as { id: string; inputs: { key: string; unit: string | null }[] }[];
    const sdof = list.find((c) => c.id === 'sdof')!;
    expect(sdof.inputs.map((i) => i.key)).toEqual(['m', 'k', 'c', 'x0', 'v0']);
    expect(sdof.inputs[0]!.unit).toBe('kg');
  });

  it('runs as `npx dampbook` through the package bin with a one-line error and no stack trace', () => {
    const ok = execFileSync('node', ['bin/dampbook.mjs', 'calc', 'sdof', '--in', 'm=10', '--in', 'k=4000', '--in', 'c=40', '--json'], { encoding: 'utf8' });
    expect(JSON.parse(ok).outputs.zeta).toBeCloseTo(0.1, 12);
    const bad = spawnSync('node', ['bin/dampbook.mjs', 'calc', 'sdof', '--in', 'm=oops', '--in', 'k=4000', '--in', 'c=40'], { encoding: 'utf8' });
    expect(bad.status).not.toBe(0);
    expect(bad.stderr.trim().split('\n')).toHaveLength(1);
    expect(bad.stderr).not.toMatch(/at .*\.ts:\d+/);
  });
});

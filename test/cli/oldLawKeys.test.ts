/**
 * `dampbook calc` still takes the old damper-law keys for the 0.3 minor versions, says on stderr how
 * it read them, and gives what the canonical keys give. Values: FEMA 274 §9.3 λ(α) (from memory) for
 * the power law, P = 50.911 W at C = 800 N·(s/m)^0.5, X = 25 mm, 1.5 Hz; the others compare the
 * old and the new spelling of the same damper (closed-form identity, no external value).
 */
import { describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main.ts';

async function run(...argv: string[]): Promise<{ code: number; out: string; err: string }> {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(argv, (s) => out.push(s), (s) => err.push(s));
  return { code, out: out.join('\n'), err: err.join('\n') };
}
const ins = (o: Record<string, string | number>) => Object.entries(o).flatMap(([k, v]) => ['--in', `${k}=${v}`]);
const outputs = (r: { out: string }) => (JSON.parse(r.out) as { outputs: Record<string, number> }).outputs;

describe('old damper-law keys on the command line', () => {
  it('c with law=power: P = 50.911 W, and a deprecation note on stderr', async () => {
    const r = await run('calc', 'energy-per-cycle', ...ins({ law: 'power', c: 800, alpha: 0.5, X: 0.025, f: 1.5 }), '--json');
    expect(r.code).toBe(0);
    expect(outputs(r).P).toBeCloseTo(50.911, 3);
    expect(r.err).toMatch(/note: 'c' with law=power is deprecated.*Fref/);
  });

  it('cRebound/cCompression give the results of the four slopes', async () => {
    const old = await run('calc', 'energy-per-cycle', ...ins({ law: 'bilinear', c1: 3000, c2: 900, cRebound: 1.2, cCompression: 0.4, vknee: 0.1, X: 0.05, f: 2 }), '--json');
    const now = await run('calc', 'energy-per-cycle', ...ins({ law: 'bilinear', c1: 3600, c2: 1080, c1c: 1200, c2c: 360, vknee: 0.1, X: 0.05, f: 2 }), '--json');
    expect(old.code).toBe(0);
    expect(outputs(old)).toEqual(outputs(now));
    expect(old.err).toMatch(/cRebound and cCompression are deprecated/);
    expect(now.err).toBe('');
  });

  it('k as the hysteretic stiffness on damper-simulation gives the kh result', async () => {
    const base = { law: 'hysteretic', eta: 0.1, m: 1, k: 100, excitation: 'none', x0: 0.01, duration: 1 };
    const old = await run('calc', 'damper-simulation', ...ins(base), '--json');
    const now = await run('calc', 'damper-simulation', ...ins({ ...base, kh: 100 }), '--json');
    expect(old.code).toBe(0);
    expect(outputs(old)).toEqual(outputs(now));
    expect(old.err).toMatch(/'k' as the stiffness of the hysteretic law is deprecated/);
  });

  it('still refuses an unknown key', async () => {
    const r = await run('calc', 'energy-per-cycle', ...ins({ law: 'linear', cFoo: 1 }));
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/no input 'cFoo'/);
  });
});

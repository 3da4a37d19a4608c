/**
 * `dampbook calc … --vary`: the JSON contract (`bounds`: output → {min, max}, SI), the text table,
 * and refusals that name the input.
 * Source of the numbers: closed form ζ = c/(2√(km)) (Rao, Mechanical Vibrations, 6th ed., §2.6;
 * provenance: closed form) at the sdof defaults m = 10 kg, k = 4000 N/m, c = 40 N·s/m.
 */
import { describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main.ts';

async function run(...argv: string[]): Promise<{ code: number; out: string; err: string }> {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(argv, (s) => out.push(s), (s) => err.push(s));
  return { code, out: out.join('\n'), err: err.join('\n') };
}

const SDOF = ['calc', 'sdof', '--in', 'm=10', '--in', 'k=4000', '--in', 'c=40'];

describe('dampbook calc --vary', () => {
  it('adds bounds {output: {min, max}} in SI: c = 40 ± 15 % → ζ 0.085 … 0.115', async () => {
    const r = await run(...SDOF, '--vary', 'c=±15%', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as { outputs: Record<string, unknown>; bounds: Record<string, { min: number; max: number }>; envelope: { method: string } };
    expect(j.outputs.zeta).toBe(0.1);
    expect(Object.keys(j.bounds.zeta!)).toEqual(['min', 'max']);
    expect(j.bounds.zeta!.min).toBeCloseTo(0.085, 12);
    expect(j.bounds.zeta!.max).toBeCloseTo(0.115, 12);
    // text outputs have no bounds; every bound is a finite pair
    expect(j.bounds.regime).toBeUndefined();
    for (const b of Object.values(j.bounds)) expect(Number.isFinite(b.min) && Number.isFinite(b.max) && b.min <= b.max).toBe(true);
    expect(j.envelope.method).toMatch(/2 corners \+ 64 interior samples/);
  });

  it('takes +-10%, lo..hi with units (read as --in reads them) and the --vary=… form: 0.08104 … 0.12122', async () => {
    const r = await run(...SDOF, '--vary=c=34..46', '--vary', 'm=+-10%', '--json');
    const j = JSON.parse(r.out) as { bounds: Record<string, { min: number; max: number }> };
    expect(j.bounds.zeta!.min).toBeCloseTo(34 / (2 * Math.sqrt(44000)), 12);
    expect(j.bounds.zeta!.max).toBeCloseTo(46 / (2 * Math.sqrt(36000)), 12);
    const u = await run(...SDOF, '--vary', 'k=3.6 kN/m..4.4 kN/m', '--json');
    const ju = JSON.parse(u.out) as { bounds: Record<string, { min: number; max: number }> };
    // ωn = √(k/m): √360 … √440 rad/s (closed form)
    expect(ju.bounds.wn!.min).toBeCloseTo(Math.sqrt(360), 10);
    expect(ju.bounds.wn!.max).toBeCloseTo(Math.sqrt(440), 10);
  });

  it('prints the envelope table with drivers in text mode', async () => {
    const r = await run(...SDOF, '--vary', 'c=±15%', '--vary', 'm=±10%');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/envelope: all 2\^2 = 4 corners/);
    expect(r.out).toMatch(/zeta\s+0\.1\s+0\.08104432\s+0\.12122064\s+m high, c low \/ m low, c high/);
  });

  it.each([
    [['--vary', 'q=±10%'], /'q'.*no such input/],
    [['--vary', 'regime=±10%'], /sdof has no such input|'regime'/],
    [['--vary', 'c=-1..46'], /'c'.*low end.*valid range.*allowed/],
    [['--vary', 'c=34..2e9'], /'c'.*high end.*valid range/],
    [['--vary', 'c=50..60'], /'c'.*nominal value lies outside/],
    [['--vary', 'c=15'], /'c'.*±15% or as low\.\.high/],
    [['--vary', 'c=34..46 furlongs'], /'c'.*tolerance end/],
    [['--vary', 'c=±10%', '--vary', 'c=±5%'], /--vary c is given twice/],
    [['--vary', 'c'], /expected key=/],
  ])('refuses %j naming the problem', async (extra, why) => {
    const r = await run(...SDOF, ...extra, '--json');
    expect(r.code).not.toBe(0);
    expect(r.err).toMatch(why);
    expect(r.err.split('\n')).toHaveLength(1);
  });

  it('refuses a choice input, an inactive input and a ninth varied input', async () => {
    const base = ['calc', 'forced-response', '--in', 'm=120', '--in', 'k=2.4e5', '--in', 'c=1200', '--in', 'f=24.75', '--in', 'F0=180'];
    expect((await run(...base, '--vary', 'excitation=±10%')).err).toMatch(/'excitation'.*choice/);
    expect((await run(...base, '--vary', 'Y=±10%')).err).toMatch(/'Y'.*does not apply/);
    const nine = ['m', 'k', 'c', 'x0', 'v0', 'a', 'b', 'd', 'e'].flatMap((k) => ['--vary', `${k}=±1%`]);
    const r = await run(...SDOF, ...nine);
    expect(r.code).not.toBe(0);
    expect(r.err).toMatch(/'e'.*at most 8 inputs/);
  });

  it('is refused by other commands and with --record', async () => {
    expect((await run('list', '--vary', 'c=±1%')).err).toMatch(/list does not take --vary/);
    expect((await run('calc', '--record', 'x.json', '--vary', 'c=±1%')).err).toMatch(/--vary is not read with --record/);
  });

  it('reports points that cannot be computed instead of hiding them', async () => {
    // forced-response at resonance: the c = 0 corner has no steady answer (r = 1 is refused without damping)
    const fn = Math.sqrt(2.4e5 / 120) / (2 * Math.PI);
    const r = await run('calc', 'forced-response', '--in', 'm=120', '--in', 'k=2.4e5', '--in', 'c=1200', '--in', `f=${fn}`, '--in', 'F0=180', '--vary', 'c=0..1500', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out) as { envelope: { failed: number; failures: { at: Record<string, number>; message: string }[] } };
    expect(j.envelope.failed).toBeGreaterThan(0);
    expect(j.envelope.failures[0]!.at.c).toBe(0);
  });
});

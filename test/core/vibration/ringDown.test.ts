import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { ComputationError } from '../../../src/core/errors.ts';
import { freeResponse, ringDown } from '../../../src/core/vibration/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

/** Mulberry32 seeded uniform generator, so every run sees the same "noise". */
function seeded(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
const normal = (u: () => number) => Math.sqrt(-2 * Math.log(1 - u())) * Math.cos(2 * Math.PI * u());

interface Synth { zeta: number; wn: number; offset: number; noise: number; cycles: number; perCycle: number; jitter: number; seed: number; phase?: number }

/** Closed-form damped cosine with offset, Gaussian noise (fraction of the first amplitude) and jittered sampling. */
function record(s: Synth): { t: number[]; y: number[] } {
  const u = seeded(s.seed);
  const wd = s.wn * Math.sqrt(1 - s.zeta * s.zeta);
  const step = (2 * Math.PI) / wd / s.perCycle;
  const t: number[] = [];
  const y: number[] = [];
  for (let i = 0; i < s.cycles * s.perCycle; i++) {
    const ti = (i + s.jitter * (u() - 0.5)) * step;
    t.push(ti);
    y.push(s.offset + Math.exp(-s.zeta * s.wn * ti) * Math.cos(wd * ti + (s.phase ?? 0.3)) + s.noise * normal(u));
  }
  return { t, y };
}

describe('ringDown', () => {
  it('recovers ζ = 0.2 and ω_n = 10 rad/s from the closed-form free response of m = 1 kg, k = 100 N/m, c = 4 N·s/m', () => {
    // Rao 6th ed. §2.6 underdamped free response (closed form; the case of table SDOF-D, calc)
    const x = freeResponse({ m: 1, k: 100, c: 4, x0: 0.01, v0: 0 });
    const t = Array.from({ length: 3001 }, (_, i) => i / 1000);
    const fit = ringDown(t, t.map((ti) => x(ti).x + 0.002));
    expectClose({ label: 'ζ', computed: fit.zeta, expected: 0.2, tol: 2e-4, why: 'noise-free record at 1 kHz; parabola peak refinement' });
    expectClose({ label: 'ωn', computed: fit.wn, expected: 10, tol: 1e-4, why: 'noise-free record at 1 kHz' });
    expectClose({ label: 'offset', computed: fit.offset, expected: 0.002, tol: 1e-3, why: 'offset recovered from the fitted envelope' });
    expect(fit.r2).toBeGreaterThan(0.9999);
  });

  it('recovers the Rao motorcycle damping ζ = 0.4037 only if enough peaks remain: it refuses with a clear message instead', () => {
    // Rao 6th ed. ch. 2 motorcycle example: amplitude falls to ¼ every half cycle; 2.5 cycles give too few peaks above 5 %
    const s = record({ zeta: 0.4037, wn: 3.4339, offset: 0, noise: 0, cycles: 2.5, perCycle: 60, jitter: 0, seed: 1, phase: 0 });
    expect(() => ringDown(s.t, s.y)).toThrow(ComputationError);
    expect(() => ringDown(s.t, s.y)).toThrow(/peaks/);
  });

  it('recovers ζ within 2 % from a seeded noisy record (ζ = 0.03, noise 1 % of the first peak, offset, uneven sampling)', () => {
    // closed form record; acceptance: ζ within 2 % (the project's requirement for this method)
    const s = record({ zeta: 0.03, wn: 20, offset: 1.2, noise: 0.01, cycles: 12, perCycle: 40, jitter: 0.6, seed: 77 });
    const fit = ringDown(s.t, s.y);
    expectClose({ label: 'ζ', computed: fit.zeta, expected: 0.03, tol: 0.02, why: 'noise 1 % of the first peak' });
    expectClose({ label: 'ωn', computed: fit.wn, expected: 20, tol: 2e-3, why: 'period from many peak times' });
  });

  it('recovers ζ within 2 % for any ζ in [0.01, 0.12] with 0.5 % noise and random offset', () => {
    fc.assert(fc.property(fc.double({ min: 0.01, max: 0.12, noNaN: true }), fc.double({ min: -5, max: 5, noNaN: true }), fc.integer({ min: 1, max: 1e6 }), (zeta, offset, seed) => {
      const cycles = Math.min(25, Math.max(5, Math.ceil(3 / (2 * Math.PI * zeta))));
      const s = record({ zeta, wn: 2 * Math.PI * 3, offset, noise: 0.005, cycles, perCycle: 50, jitter: 0.5, seed });
      return Math.abs(ringDown(s.t, s.y).zeta / zeta - 1) < 0.02;
    }), { seed: 1, numRuns: 40 });
  });

  it('handles a long record (200 000 samples) without running out of stack', () => {
    const s = record({ zeta: 0.002, wn: 2 * Math.PI * 50, offset: 0, noise: 0.001, cycles: 2000, perCycle: 100, jitter: 0, seed: 9 });
    expect(s.t.length).toBe(200_000);
    expect(Math.abs(ringDown(s.t, s.y).zeta / 0.002 - 1)).toBeLessThan(0.02);
  });

  it('refuses a record that does not decay', () => {
    const t = Array.from({ length: 800 }, (_, i) => i / 200);
    expect(() => ringDown(t, t.map((ti) => Math.cos(2 * Math.PI * 3 * ti) + 0.01 * Math.sin(97 * ti)))).toThrow(/do not decay/);
  });

  it('refuses a growing (self-excited) record', () => {
    const t = Array.from({ length: 800 }, (_, i) => i / 200);
    expect(() => ringDown(t, t.map((ti) => Math.exp(0.3 * ti) * Math.cos(2 * Math.PI * 3 * ti)))).toThrow(ComputationError);
  });

  it('refuses pure noise and a flat record', () => {
    const u = seeded(3);
    const t = Array.from({ length: 500 }, (_, i) => i / 100);
    expect(() => ringDown(t, t.map(() => normal(u)))).toThrow(ComputationError);
    expect(() => ringDown(t, t.map(() => 1))).toThrow(/flat/);
  });
});

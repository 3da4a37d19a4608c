import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import type { DamperLaw } from '../../../src/core/dampers/index.ts';
import { InputRangeError } from '../../../src/core/errors.ts';
import { simulateSdof, type Excitation, type SdofModel } from '../../../src/core/simulation/index.ts';
import { linearExact } from '../ode/linearOscillator.ts';

/** Largest |x_sim − x_exact| over the sampled history. */
function worstError(model: SdofModel, duration: number, exact: (t: number) => { x: number }): number {
  const r = simulateSdof(model, { duration, samples: 401 });
  return Math.max(...r.history.t.map((t, i) => Math.abs(r.history.x[i]! - exact(t).x)));
}

describe('simulateSdof input checks', () => {
  const base: SdofModel = { m: 1, k: 100, law: { kind: 'linear', c: 4 }, excitation: { kind: 'none' }, x0: 0.01, v0: 0 };
  it('rejects a zero duration naming duration', () => {
    expect(() => simulateSdof(base, { duration: 0 })).toThrow(InputRangeError);
    expect(() => simulateSdof(base, { duration: 0 })).toThrow(/'duration'/);
  });
  it('rejects a negative mass naming m', () => expect(() => simulateSdof({ ...base, m: -1 }, { duration: 1 })).toThrow(/'m'/));
  it('rejects a power-law exponent above 2 naming alpha', () =>
    expect(() => simulateSdof({ ...base, law: { kind: 'power', C: 1, alpha: 2.5 } }, { duration: 1 })).toThrow(/'alpha'/));
  it('rejects a tolerance looser than 1e-3 naming rtol', () => expect(() => simulateSdof(base, { duration: 1, rtol: 0.01 })).toThrow(/'rtol'/));
});

// Closed forms: free response, Rao, Mechanical Vibrations 6th ed. §2.6; harmonic steady state
// and base excitation in relative coordinates, Rao §3.4–3.6 / Chopra, Dynamics of Structures 5th
// ed. §3.2, §3.6 (section numbers from memory). Error bar: at the default rtol 1e-9 the global
// error over a few tens of periods stays below 1e-7 of the response amplitude.
describe('simulateSdof against closed forms (linear law)', () => {
  it('free vibration: error below 1e-7 of the release displacement over 3 s (≈ 5 periods)', () => {
    const p = { m: 1, k: 100, c: 4, F0: 0, w: 1, x0: 0.01, v0: 0.2 };
    expect(worstError({ m: 1, k: 100, law: { kind: 'linear', c: 4 }, excitation: { kind: 'none' }, x0: p.x0, v0: p.v0 }, 3, linearExact(p))).toBeLessThan(1e-7 * 0.03);
  });
  it('harmonic force: transient plus steady state within 1e-7 of the amplitude over 4 s', () => {
    const p = { m: 2, k: 800, c: 8, F0: 50, w: 17, x0: 0.002, v0: -0.1 };
    const err = worstError({ m: 2, k: 800, law: { kind: 'linear', c: 8 }, excitation: { kind: 'force', F0: 50, omega: 17 }, x0: p.x0, v0: p.v0 }, 4, linearExact(p));
    expect(err).toBeLessThan(1e-7 * 0.05);
  });
  it('base excitation: relative motion equals the forced response to m·Y·ω² sin ωt', () => {
    const Y = 0.01, w = 12, m = 1.5, k = 300, c = 3;
    const p = { m, k, c, F0: m * Y * w * w, w, x0: 0, v0: 0 };
    const err = worstError({ m, k, law: { kind: 'linear', c }, excitation: { kind: 'base', Y, omega: w }, x0: 0, v0: 0 }, 5, linearExact(p));
    expect(err).toBeLessThan(1e-7 * 0.05);
  });
  it('hysteretic law is simulated as the viscous damper ηk/ω at the excitation frequency (Chopra §3.10, from memory)', () => {
    const ex: Excitation = { kind: 'force', F0: 10, omega: 9 };
    const a = simulateSdof({ m: 1, k: 100, law: { kind: 'hysteretic', eta: 0.2, k: 100 }, excitation: ex, x0: 0, v0: 0 }, { duration: 3 });
    const b = simulateSdof({ m: 1, k: 100, law: { kind: 'linear', c: (0.2 * 100) / 9 }, excitation: ex, x0: 0, v0: 0 }, { duration: 3 });
    expect(a.xEnd).toBe(b.xEnd);
  });
  it('bilinear law with equal slopes in both directions reproduces the linear law', () => {
    const lin = simulateSdof({ m: 1, k: 100, law: { kind: 'linear', c: 3 }, excitation: { kind: 'none' }, x0: 0.01, v0: 0 }, { duration: 2 });
    const bil = simulateSdof({ m: 1, k: 100, law: { kind: 'bilinear', rebound: { c1: 3, c2: 3 }, compression: { c1: 3, c2: 3 }, vknee: 0.02 }, excitation: { kind: 'none' }, x0: 0.01, v0: 0 }, { duration: 2 });
    expect(Math.abs(lin.xEnd - bil.xEnd)).toBeLessThan(1e-10);
  });
});

// Coulomb damping in free vibration: each half cycle lasts π/ω_n and loses 2F_f/k of amplitude;
// the mass stops at the first reversal where k|z| ≤ F_f (Rao, Mechanical Vibrations 6th ed.
// §2.9; Den Hartog, Mechanical Vibrations 4th ed. §8.6; both from memory).
describe('simulateSdof with Coulomb friction', () => {
  const model: SdofModel = { m: 1, k: 100, law: { kind: 'coulomb', Ff: 0.1 }, excitation: { kind: 'none' }, x0: 0.0105, v0: 0 };
  const r = simulateSdof(model, { duration: 3, samples: 3001 });
  it('loses 2F_f/k = 2 mm per half cycle and sticks at −0.5 mm after five half periods', () => {
    expect(Math.abs(r.xEnd - -0.0005)).toBeLessThan(1e-9);
    expect(Math.abs(r.stuckTime - (3 - (5 * Math.PI) / 10))).toBeLessThan(1e-9);
  });
  it('turns at the predicted amplitudes 10.5, −8.5, 6.5, −4.5, 2.5 mm', () => {
    const peaks: number[] = [];
    for (let i = 1; i + 1 < r.history.t.length; i++) {
      const [a, b, c] = [r.history.x[i - 1]!, r.history.x[i]!, r.history.x[i + 1]!];
      if ((b > a && b >= c) || (b < a && b <= c)) peaks.push(b);
    }
    // samples are 1 ms apart: a turning point is missed by at most ½·ω²z·(0.5 ms)² ≈ 1.3e-7 m
    [-0.0085, 0.0065, -0.0045, 0.0025].forEach((z, i) => expect(Math.abs(peaks[i]! - z)).toBeLessThan(2e-7));
  });
  it('dissipates exactly the lost spring energy, F_f × total sliding distance', () => {
    const slide = 0.0105 + 2 * (0.0085 + 0.0065 + 0.0045 + 0.0025) + 0.0005;
    expect(Math.abs(r.dissipated - 0.1 * slide)).toBeLessThan(1e-9);
    expect(r.closure).toBeLessThan(1e-8);
  });
  it('stays stuck for good when the drive never exceeds the friction force', () => {
    const s = simulateSdof({ ...model, x0: 0.0005, excitation: { kind: 'force', F0: 0.04, omega: 5 } }, { duration: 5 });
    expect(s.stuckTime).toBe(5);
    expect(s.dissipated).toBe(0);
  });
});

const lawArb: fc.Arbitrary<DamperLaw> = fc.oneof(
  fc.record({ kind: fc.constant('linear' as const), c: fc.double({ min: 0.01, max: 50, noNaN: true }) }),
  fc.record({ kind: fc.constant('power' as const), C: fc.double({ min: 0.01, max: 50, noNaN: true }), alpha: fc.double({ min: 0.1, max: 2, noNaN: true }) }),
  fc.record({ kind: fc.constant('coulomb' as const), Ff: fc.double({ min: 0.001, max: 0.5, noNaN: true }) }),
  fc.record({
    kind: fc.constant('bilinear' as const),
    rebound: fc.record({ c1: fc.double({ min: 0.1, max: 50, noNaN: true }), c2: fc.double({ min: 0.1, max: 50, noNaN: true }) }),
    compression: fc.record({ c1: fc.double({ min: 0.1, max: 50, noNaN: true }), c2: fc.double({ min: 0.1, max: 50, noNaN: true }) }),
    vknee: fc.double({ min: 0.001, max: 0.5, noNaN: true }),
  }),
  fc.record({ kind: fc.constant('hysteretic' as const), eta: fc.double({ min: 0.01, max: 1, noNaN: true }), k: fc.constant(100) }),
);
// Amplitudes are 0 or at least 0.1 mm (0.01 N): engineering magnitudes, not subnormal numbers.
const magnitude = (min: number, max: number) =>
  fc.oneof(fc.constant(0), fc.double({ min, max, noNaN: true }), fc.double({ min: -max, max: -min, noNaN: true }));
const excitationArb: fc.Arbitrary<Excitation> = fc.oneof(
  fc.constant({ kind: 'none' as const }),
  fc.record({ kind: fc.constant('force' as const), F0: fc.oneof(fc.constant(0), fc.double({ min: 0.01, max: 5, noNaN: true })), omega: fc.double({ min: 1, max: 40, noNaN: true }) }),
  fc.record({ kind: fc.constant('base' as const), Y: fc.oneof(fc.constant(0), fc.double({ min: 1e-4, max: 0.05, noNaN: true })), omega: fc.double({ min: 1, max: 40, noNaN: true }) }),
);

describe('simulateSdof invariants', () => {
  it('closes the energy audit below 1e-6 of the energy scale for random passive systems at default tolerances', () => {
    // m = 1 kg, k = 100 N/m (f_n = 1.6 Hz); any law, drive and start; 3 s ≈ 5 natural periods
    fc.assert(fc.property(lawArb, excitationArb, magnitude(1e-4, 0.05), magnitude(1e-3, 0.5),
      (law, excitation, x0, v0) => {
        const r = simulateSdof({ m: 1, k: 100, law, excitation, x0, v0 }, { duration: 3 });
        return r.closure < 1e-6;
      }), { seed: 1, numRuns: 60 });
  });
  it('never lets the dissipated energy decrease for a passive law', () => {
    fc.assert(fc.property(lawArb, excitationArb, (law, excitation) => {
      const h = simulateSdof({ m: 1, k: 100, law, excitation, x0: 0.02, v0: 0 }, { duration: 2, samples: 201 }).history;
      return h.dissipated.every((e, i) => i === 0 || e >= h.dissipated[i - 1]! - 1e-12);
    }), { seed: 1, numRuns: 30 });
  });
  it('never ends free vibration with more energy than it started with', () => {
    fc.assert(fc.property(lawArb, fc.double({ min: 1e-3, max: 0.05, noNaN: true }), (law, x0) => {
      const r = simulateSdof({ m: 1, k: 100, law, excitation: { kind: 'none' }, x0, v0: 0 }, { duration: 2 });
      return r.finalEnergy <= r.E0 * (1 + 1e-8);
    }), { seed: 1, numRuns: 30 });
  });
});

describe('simulateSdof: the step budget', () => {
  it('names the whole run\'s budget when it runs out (was "ODE: more than 1 steps before t = …")', () => {
    // invented extreme case: Coulomb friction under a 50 rad/s force for 1e5 s (millions of stick–slip phases)
    const run = () => simulateSdof({ m: 1, k: 100, law: { kind: 'coulomb', Ff: 5 }, excitation: { kind: 'force', F0: 10, omega: 50 }, x0: 0, v0: 0 }, { duration: 1e5 });
    expect(run).toThrow(/more than 100 000 integration steps in all/);
    expect(run).not.toThrow(/more than \d steps/);
  });
});

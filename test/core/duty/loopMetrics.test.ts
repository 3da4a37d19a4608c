import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { loopMetrics, parseRecordedMotion, recordedMotion } from '../../../src/core/duty/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

/** A Kelvin–Voigt element F = kx + cẋ driven by x = X sin ωt, as a CSV record (time, x, F). */
function kelvinVoigtRecord(o: { k: number; c: number; X: number; f: number; cycles: number; perCycle: number; offset?: number; velocity?: boolean }): string {
  const w = 2 * Math.PI * o.f;
  const n = o.cycles * o.perCycle;
  const rows = [o.velocity ? 'time [s],v [m/s],force [N]' : 'time [s],x [m],force [N]'];
  for (let i = 0; i <= n; i++) {
    const t = i / (o.perCycle * o.f);
    const x = o.X * Math.sin(w * t);
    const v = o.X * w * Math.cos(w * t);
    rows.push(`${t.toPrecision(15)},${(o.velocity ? v : x + (o.offset ?? 0)).toPrecision(15)},${(o.k * x + o.c * v).toPrecision(15)}`);
  }
  return rows.join('\n');
}

function metricsOf(text: string) {
  const rec = parseRecordedMotion(text);
  const r = recordedMotion(rec, undefined);
  const x = rec.x ? Float64Array.from(rec.x) : undefined;
  return { r, m: loopMetrics(r.t, x ?? integrate(r.t, r.v), r.F, r.cycleRanges) };
}
function integrate(t: Float64Array, v: Float64Array): Float64Array {
  const x = new Float64Array(t.length);
  for (let i = 1; i < t.length; i++) x[i] = x[i - 1]! + 0.5 * (v[i]! + v[i - 1]!) * (t[i]! - t[i - 1]!);
  return x;
}

// Closed forms of the Kelvin–Voigt loop under x = X sin ωt (Chopra, Dynamics of Structures, 5th ed.,
// §3.8, eq. 3.8.1 E_D = πcωX² and the elliptical loop of Fig. 3.8.x, from memory): the force at the
// extremes is ±kX (velocity zero), so k_eff = k; at x = 0 the force is ±cωX; β_eff = E/(2π k X²) = cω/(2k).
const KV = { k: 2e5, c: 5000, X: 0.02, f: 1.5 };
const w = 2 * Math.PI * KV.f;
const closed = { keff: KV.k, Eloop: Math.PI * KV.c * w * KV.X ** 2, betaEff: (KV.c * w) / (2 * KV.k), F0: KV.c * w * KV.X };

describe('loop metrics of a recorded force–displacement loop', () => {
  it('match the Kelvin–Voigt closed forms to 1e-4 (k = 2e5 N/m, c = 5000 N·s/m, X = 20 mm, 1.5 Hz)', () => {
    // 400 samples per cycle: the trapezoid ∮F dx is exact for kx and spectrally accurate for the periodic
    // cẋ part; the parabola vertex puts F± within ~(ωh)³ of the true extremes; linear interpolation at
    // x = 0 errs by (ωh)²/8 ≈ 3e-5 of cωX. So 1e-4 holds with margin (closed form, provenance: closed form).
    expect(closed.Eloop).toBeCloseTo(59.22, 2);
    expect(closed.betaEff).toBeCloseTo(0.1178, 4);
    expect(closed.F0).toBeCloseTo(942.5, 1);
    const { m } = metricsOf(kelvinVoigtRecord({ ...KV, cycles: 4, perCycle: 400 }));
    expect(m.cycles.length).toBe(3);
    for (const key of ['keff', 'Eloop', 'betaEff', 'F0'] as const) {
      expectClose({ label: key, computed: m[key]!, expected: closed[key], tol: 1e-4, why: '400 samples per cycle, see above' });
    }
    // a cycle starts at the first sample with v ≥ 0, so two cycles may differ by one sample: a spread of ~1e-4, not 0
    expect(m.EloopDevMax).toBeLessThan(5e-4);
    // fullness of an ellipse: E/(4 F_max X) with F_max = X√(k² + c²ω²)
    expectClose({ label: 'fullness', computed: m.fullness, expected: closed.Eloop / (4 * KV.X * KV.X * Math.hypot(KV.k, KV.c * w)), tol: 1e-4, why: 'F_max sampled within (ωh)²/8 of its peak' });
  });
  it('measures displacement from mid-stroke: an offset record gives the same metrics', () => {
    const { m } = metricsOf(kelvinVoigtRecord({ ...KV, cycles: 3, perCycle: 400, offset: 0.15 }));
    expectClose({ label: 'keff', computed: m.keff, expected: KV.k, tol: 1e-4, why: 'offset removed per cycle' });
    expectClose({ label: 'F0', computed: m.F0, expected: closed.F0, tol: 1e-4 });
  });
  it('reads a velocity-only record through the integrated displacement', () => {
    const { m } = metricsOf(kelvinVoigtRecord({ ...KV, cycles: 3, perCycle: 400, velocity: true }));
    // the integrated x differs from the true one by the trapezoid's (ωh)²/12 ≈ 2e-5: 1e-4 holds
    expectClose({ label: 'Eloop', computed: m.Eloop, expected: closed.Eloop, tol: 1e-4 });
    expectClose({ label: 'betaEff', computed: m.betaEff!, expected: closed.betaEff, tol: 1e-4 });
  });
  it('a pure viscous loop has zero effective stiffness and the fullness of an ellipse, π/4', () => {
    const { m } = metricsOf(kelvinVoigtRecord({ ...KV, k: 0, cycles: 3, perCycle: 400 }));
    expect(m.keff / (KV.c * w)).toBeLessThan(1e-4);
    expect(m.betaEff).toBeUndefined(); // k_eff → 0: β_eff is not defined
    expectClose({ label: 'fullness', computed: m.fullness, expected: Math.PI / 4, tol: 1e-4, why: 'closed form π cωX²/(4·cωX·X)' });
  });
  it('scaling the force by λ scales E_loop, k_eff and F₀ by λ and leaves β_eff and fullness unchanged', () => {
    const base = metricsOf(kelvinVoigtRecord({ ...KV, cycles: 3, perCycle: 200 })).m;
    fc.assert(fc.property(fc.double({ min: 0.01, max: 100, noNaN: true }), (lam) => {
      const s = metricsOf(kelvinVoigtRecord({ ...KV, k: KV.k * lam, c: KV.c * lam, cycles: 3, perCycle: 200 })).m;
      return Math.abs(s.Eloop / (lam * base.Eloop) - 1) < 1e-9 && Math.abs(s.keff / (lam * base.keff) - 1) < 1e-9
        && Math.abs(s.betaEff! / base.betaEff! - 1) < 1e-9 && Math.abs(s.fullness / base.fullness - 1) < 1e-9;
    }), { seed: 1, numRuns: 20 });
  });
});

/**
 * The power-against-speed chart of road-power (src/calculators/duty/road-power.speed.ts) draws 60
 * log-spaced speeds per class from a few evaluations. Reference: direct evaluation of the same
 * quarter-car model (roadDamperPower) at each checked point — the shortcut rests on the closed-form
 * scaling G_z(f) = G_d(n0)·n0^w·V^(w−1)·f^(−w) of ISO 8608 §5 (from memory), so agreement checks
 * the scaling and the interpolation, not the model itself (that is in the road-power cases).
 */
import { describe, expect, it } from 'vitest';
import { roadDamperPower, roadRoughness, type RoadDamper } from '../../src/core/duty/index.ts';
import { powerAgainstSpeed } from '../../src/calculators/duty/road-power.speed.ts';

const car = { ms: 240, mu: 36, ks: 16000, kt: 180000 };
const direct = (cls: string, V: number, w: number, d: RoadDamper) => roadDamperPower(car, { Gd0: roadRoughness(cls, 'mean').Gd0, w, V }, d, 1e-6);

describe('powerAgainstSpeed', () => {
  it('gives 60 log-spaced speeds for 8 classes', () => {
    const p = powerAgainstSpeed(car, 2, { kind: 'linear', c: 1000 }, 2.5, 40);
    expect(p.speeds).toHaveLength(60);
    expect(p.classes.map((c) => c.cls)).toEqual(['A', 'B', 'C', 'D', 'E', 'F', 'G', 'H']);
    const r = p.speeds.slice(1).map((v, i) => v / p.speeds[i]!);
    for (const x of r) expect(x).toBeCloseTo(r[0]!, 10);
  });

  for (const [w, d] of [[2.5, { kind: 'linear', c: 1000 }], [1.5, { kind: 'linear', c: 1000 }], [2.5, { kind: 'power', C: 700, alpha: 0.5 }], [1.8, { kind: 'power', C: 1200, alpha: 1.6 }]] as const) {
    it(`matches direct evaluation within 1 % (w = ${w}, ${d.kind})`, () => {
      const p = powerAgainstSpeed(car, w, d, 2.5, 40);
      for (const [ci, vi] of [[0, 0], [2, 17], [4, 41], [7, 59], [5, 30]] as const) {
        const c = p.classes[ci]!;
        expect(c.power[vi]! / direct(c.cls, p.speeds[vi]!, w, d) - 1, `${c.cls} at ${p.speeds[vi]}`).toBeLessThan(0.01);
        expect(c.power[vi]! / direct(c.cls, p.speeds[vi]!, w, d) - 1).toBeGreaterThan(-0.01);
      }
    });
  }
});

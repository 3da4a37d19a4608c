/**
 * Block-averaged power of a record: the energy per block is the exact integral of the trapezoid
 * rule's own interpolant, so the blocks carry the record's energy on any sampling, gaps removed
 * (trapezoid rule: Burden & Faires, Numerical Analysis, 9th ed., §4.3, from memory; closed form).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { blockPower, findSegments, MAX_POWER_BLOCKS, parseRecordedMotion, recordedMotion } from '../../../src/core/duty/index.ts';
import { ComputationError } from '../../../src/core/errors.ts';
import { sineRecord } from '../../../src/calculators/duty/recorded-motion.demo.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('blockPower', () => {
  it('integrates a linear trace exactly on each block (hand-worked example)', () => {
    // p rises 0 → 2 W over [0, 1] s, then holds 2 W to 3 s. By hand:
    // block 0 [0, 1.5): ∫₀¹ 2t dt + 2·0.5 = 2 J → 4/3 W; block 1 [1.5, 3): 2·1.5 = 3 J → 2 W
    const b = blockPower([0, 1, 3], [0, 2, 2], [[0, 3]], 2);
    expect(b.t).toEqual([0, 1.5, 3]);
    expectClose({ label: 'P0', computed: b.P[0]!, expected: 4 / 3, tol: 1e-15, why: 'closed form' });
    expectClose({ label: 'P1', computed: b.P[1]!, expected: 2, tol: 1e-15, why: 'closed form' });
    expectClose({ label: 'E', computed: b.E, expected: 5, tol: 1e-15, why: 'closed form' });
  });

  it('keeps the energy of the record, ∑P_k Δt_k = E, on uneven sampling with gaps', () => {
    // the recorded-motion energy E (trapezoid over the segments) is the reference
    const csv = sineRecord({ X: 0.02, f: 1.5, cycles: 3, rate: 1500, columns: 'txF', c: 2000, jitter: 0.3 });
    const lines = csv.split('\n');
    // cut out two stretches to make gaps
    const gapped = [...lines.slice(0, 900), ...lines.slice(1300, 2400), ...lines.slice(2600)].join('\n');
    const rec = parseRecordedMotion(gapped);
    const r = recordedMotion(rec, undefined);
    expect(r.segments.gaps).toBe(2);
    const b = blockPower(r.t, r.p, r.segments.ranges);
    expect(b.P.length).toBe(MAX_POWER_BLOCKS);
    const sum = b.P.reduce((s, p, k) => s + p * (b.t[k + 1]! - b.t[k]!), 0);
    expectClose({ label: '∑PΔt vs E of the record', computed: sum, expected: r.E, tol: 1e-12, why: 'same trapezoid energy, summed in another order' });
    expectClose({ label: 'covered time', computed: b.t[b.t.length - 1]!, expected: r.duration, tol: 1e-12, why: 'gaps removed as in the mean power' });
  });

  it('keeps the energy of any uneven trace with any block count (property)', () => {
    const trace = fc.array(fc.tuple(fc.double({ min: 1e-4, max: 10, noNaN: true }), fc.double({ min: -1e3, max: 1e4, noNaN: true })), { minLength: 2, maxLength: 300 });
    fc.assert(fc.property(trace, fc.integer({ min: 1, max: 150 }), (rows, N) => {
      const t: number[] = [];
      let acc = 0;
      for (const [dt] of rows) { t.push(acc); acc += dt; }
      const p = rows.map(([, P]) => P);
      const seg = findSegments(t, 5);
      const b = blockPower(t, p, seg.ranges, N);
      let E = 0;
      let scale = 0;
      for (const [a, c] of seg.ranges) for (let i = a + 1; i < c; i++) { E += 0.5 * (p[i]! + p[i - 1]!) * (t[i]! - t[i - 1]!); scale += 0.5 * (Math.abs(p[i]!) + Math.abs(p[i - 1]!)) * (t[i]! - t[i - 1]!); }
      const sum = b.P.reduce((s, x, k) => s + x * (b.t[k + 1]! - b.t[k]!), 0);
      expect(b.P.length).toBeLessThanOrEqual(Math.min(N, MAX_POWER_BLOCKS));
      expect(Math.abs(sum - E)).toBeLessThanOrEqual(1e-10 * (scale + 1e-300) + 1e-300);
      expect(b.t.every((x, k) => k === 0 || x > b.t[k - 1]!)).toBe(true);
    }), { seed: 1, numRuns: 100 });
  });

  it('gives a constant trace back as constant blocks, and refuses a record covering no time', () => {
    const b = blockPower([0, 0.1, 0.25, 0.3, 1], [7, 7, 7, 7, 7], [[0, 5]], 4);
    for (const x of b.P) expectClose({ label: 'constant', computed: x, expected: 7, tol: 1e-14, why: 'closed form' });
    expect(() => blockPower([0], [1], [[0, 1]])).toThrow(ComputationError);
  });
});

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseRecordedMotion, recordedMotion, findSegments, differentiate } from '../../../src/core/duty/index.ts';
import { InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('recorded-motion CSV', () => {
  it('reads names and units from the header and converts to SI', () => {
    const r = parseRecordedMotion('time [ms],stroke (mm),force [kN]\n0,1,2\n10,2,3\n20,3,4');
    expect(r.t).toEqual([0, 0.01, 0.02]);
    expect(r.x![1]).toBeCloseTo(0.002, 15);
    expect(r.F![2]).toBe(4000);
  });
  it('reads a separate units row, a semicolon delimiter and decimal commas', () => {
    const r = parseRecordedMotion('Zeit;Weg;Kraft\ns;mm;N\n0,0;1,5;10\n0,1;2,5;20\n0,2;3,5;30', 'txF');
    expect(r.t).toEqual([0, 0.1, 0.2]);
    expectClose({ label: 'x', computed: r.x![0]!, expected: 0.0015, tol: 1e-12 });
  });
  it('accounts for every line: used + rejected + skipped + header + units = lines', () => {
    const text = '# dyno D-3\ntime [s],x [mm]\n\n0,0\n0.01,abc\n0.02,2\n0.015,3\n0.03,\n0.04,4\n# end';
    const r = parseRecordedMotion(text);
    expect(r.t.length).toBe(3);
    expect(r.rejected.map((b) => b.row)).toEqual([5, 7, 8]);
    expect(r.rejected[0]!.reason).toMatch(/not a number/);
    expect(r.rejected[1]!.reason).toMatch(/does not increase/);
    expect(r.rejected[2]!.reason).toMatch(/missing value/);
    expect(r.t.length + r.rejected.length + r.skipped + 1).toBe(text.split('\n').length);
  });
  it('names the row and column of an unknown unit', () => {
    expect(() => parseRecordedMotion('time [s],x [furlong]\n0,0\n1,1\n2,2')).toThrow(/row 1, column 2: 'furlong'/);
  });
  it('names the first bad row when too little of the file is usable', () => {
    expect(() => parseRecordedMotion('time [s],x [m]\n0,0\n1,x\n2,y\n3,z')).toThrow(InputRangeError);
    expect(() => parseRecordedMotion('time [s],x [m]\n0,0\n1,x\n2,y\n3,z')).toThrow(/row 3/);
  });
  it('asks for the layout when unnamed columns are ambiguous', () => {
    expect(() => parseRecordedMotion('0,0\n1,1\n2,2')).toThrow(/choose the column layout/);
    expect(parseRecordedMotion('0,0\n1,1\n2,2', 'tv').v).toEqual([0, 1, 2]);
  });
  it('refuses an empty record', () => {
    expect(() => parseRecordedMotion('\n# nothing\n')).toThrow(/empty/);
  });
});

describe('segments and differentiation', () => {
  it('splits at gaps longer than 5× the median interval', () => {
    const s = findSegments([0, 1, 2, 3, 20, 21, 22]);
    expect(s.gaps).toBe(1);
    expect(s.ranges).toEqual([[0, 4], [4, 7]]);
  });
  it('differentiates a quadratic exactly on an uneven grid [fornberg1988, three-point weights (from memory); closed form]', () => {
    fc.assert(fc.property(fc.array(fc.double({ min: 0.1, max: 2, noNaN: true }), { minLength: 4, maxLength: 30 }), (steps) => {
      const t: number[] = [0];
      for (const h of steps) t.push(t[t.length - 1]! + h);
      const x = t.map((ti) => 3 * ti * ti - 2 * ti + 1);
      const out = new Float64Array(t.length);
      differentiate(t, x, 0, t.length, out);
      for (let i = 1; i < t.length - 1; i++) expect(Math.abs(out[i]! - (6 * t[i]! - 2))).toBeLessThan(1e-8 * (1 + Math.abs(6 * t[i]!)));
    }), { seed: 1, numRuns: 100 });
  });
});

describe('power and energy of a record', () => {
  const sine = (n: number, c: number) => {
    const w = 2 * Math.PI;
    const t = Array.from({ length: n + 1 }, (_, i) => (2 * i) / n);
    return { t, x: t.map((ti) => 0.02 * Math.sin(w * ti)), F: t.map((ti) => c * 0.02 * w * Math.cos(w * ti)) };
  };
  it('linear damper over whole cycles: mean power ½cω²X² [chopra2017 eq. 3.8.1; published]', () => {
    const s = sine(4000, 1000);
    const r = recordedMotion({ t: s.t, x: s.x, columns: { index: { t: 0, x: 1 }, factor: {}, assumedSI: [], ignored: [] }, rejected: [], skipped: 0 }, { kind: 'linear', c: 1000 });
    expectClose({ label: 'P', computed: r.meanPower, expected: 0.5 * 1000 * (2 * Math.PI) ** 2 * 0.02 ** 2, tol: 1e-5, why: '2000 samples per cycle, O(h²) differentiation' });
    expectClose({ label: 'E per cycle', computed: r.cycleEnergies[0]!, expected: Math.PI * 1000 * 2 * Math.PI * 0.02 ** 2, tol: 1e-4, why: 'cycle starts at the sample after the crossing' });
    expect(r.summary.meanPower).toBe(r.meanPower);
    expect(r.summary.profile!.t.length).toBeLessThanOrEqual(2001);
  });
  it('a measured force with the opposite sign convention is flipped and said so', () => {
    const s = sine(2000, -800);
    const r = recordedMotion({ t: s.t, x: s.x, F: s.F, columns: { index: { t: 0, x: 1, F: 2 }, factor: {}, assumedSI: [], ignored: [] }, rejected: [], skipped: 0 }, undefined);
    expect(r.flipped).toBe(true);
    expect(r.meanPower).toBeGreaterThan(0);
  });
  it('mean power is never negative for a dissipative law, whatever the motion', () => {
    fc.assert(fc.property(fc.array(fc.double({ min: -0.1, max: 0.1, noNaN: true }), { minLength: 5, maxLength: 200 }), fc.constantFrom('linear', 'power', 'coulomb'), (x, kind) => {
      const t = x.map((_, i) => i * 0.01);
      const law = kind === 'linear' ? { kind, c: 1000 } as const : kind === 'power' ? { kind, C: 800, alpha: 0.4 } as const : { kind, Ff: 100 } as const;
      const r = recordedMotion({ t, x, columns: { index: { t: 0, x: 1 }, factor: {}, assumedSI: [], ignored: [] }, rejected: [], skipped: 0 }, law);
      expect(r.meanPower).toBeGreaterThanOrEqual(0);
    }), { seed: 1, numRuns: 100 });
  });
  it('integrates nothing across a gap', () => {
    const t = [0, 0.01, 0.02, 0.03, 5, 5.01, 5.02, 5.03];
    const v = [1, 1, 1, 1, 1, 1, 1, 1];
    const r = recordedMotion({ t, v, columns: { index: { t: 0, v: 1 }, factor: {}, assumedSI: [], ignored: [] }, rejected: [], skipped: 0 }, { kind: 'linear', c: 100 });
    expectClose({ label: 'duration', computed: r.duration, expected: 0.06, tol: 1e-9 });
    expectClose({ label: 'E', computed: r.E, expected: 100 * 0.06, tol: 1e-9 });
  });
});

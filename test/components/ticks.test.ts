/**
 * Axis ticks shared by the static SVG and the live charts (src/components/render/ticks.ts).
 * Provenance: the 1-2-5 ladder of "nice" steps and decade ticks on log axes are common practice,
 * no source; the checks below are the module's defining properties (labels never overlap for a
 * character-width estimate, one number format per axis), tested over random axes with a fixed seed,
 * plus the collisions seen on the road-power page ("0.60.81", "6080100", "100000 50000").
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { chooseTicks, collides, labelExtent, labelGap, linearLabels, logLabels, niceRange, tickOffset, type TickOptions } from '../../src/components/render/ticks.ts';

const x = (lengthPx: number, log: boolean, charPx = 6): TickOptions => ({ log, lengthPx, charPx, along: 'width' });
const labels = (lo: number, hi: number, o: TickOptions) => chooseTicks(lo, hi, o).map((t) => t.label);

/** Extents [start, end] along the axis of the chosen labels, centred on their ticks. */
function extents(lo: number, hi: number, o: TickOptions) {
  return chooseTicks(lo, hi, o).map((t) => {
    const c = tickOffset(t.value, lo, hi, o);
    const w = labelExtent(t.label, o);
    return [c - w / 2, c + w / 2] as const;
  });
}

const axis = fc.record({
  log: fc.boolean(),
  lo: fc.double({ min: -9, max: 9, noNaN: true }),
  decades: fc.double({ min: 0.01, max: 14, noNaN: true }),
  lengthPx: fc.double({ min: 30, max: 2000, noNaN: true }),
  charPx: fc.double({ min: 4, max: 10, noNaN: true }),
  vertical: fc.boolean(),
  negative: fc.boolean(),
});

function build(a: { log: boolean; lo: number; decades: number; lengthPx: number; charPx: number; vertical: boolean; negative: boolean }) {
  const o: TickOptions = { log: a.log, lengthPx: a.lengthPx, charPx: a.charPx, along: a.vertical ? 'height' : 'width' };
  if (a.log) return { lo: 10 ** a.lo, hi: 10 ** (a.lo + a.decades), o };
  // linear: an offset range of random magnitude, sometimes straddling zero
  const lo = (a.negative ? -1 : 1) * 10 ** a.lo;
  return { lo, hi: lo + 10 ** (a.lo + a.decades / 4) * (a.negative ? 2.5 : 1), o };
}

describe('chooseTicks: labels never collide', () => {
  it('chosen labels keep at least the gap between them, for random ranges and axis lengths (property)', () => {
    fc.assert(fc.property(axis, (a) => {
      const { lo, hi, o } = build(a);
      const e = extents(lo, hi, o);
      for (let i = 1; i < e.length; i++) expect(e[i]![0] - e[i - 1]![1]).toBeGreaterThanOrEqual(labelGap(o) - 1e-6);
      expect(collides(chooseTicks(lo, hi, o), lo, hi, o)).toBe(false);
    }), { seed: 1, numRuns: 600 });
  });

  it('every tick lies on the axis, and an axis with room shows at least two', () => {
    fc.assert(fc.property(axis, (a) => {
      const { lo, hi, o } = build(a);
      const t = chooseTicks(lo, hi, o);
      for (const v of t) { expect(v.value).toBeGreaterThanOrEqual(lo - (hi - lo) * 1e-9); expect(v.value).toBeLessThanOrEqual(hi + Math.abs(hi) * 1e-9); }
      if (o.lengthPx >= 300) expect(t.length).toBeGreaterThanOrEqual(2);
    }), { seed: 1, numRuns: 600 });
  });
});

describe('chooseTicks: one number format per axis', () => {
  it('a linear axis writes every label with the same decimals and the same exponent (property)', () => {
    fc.assert(fc.property(axis, (a) => {
      const { lo, hi, o } = build({ ...a, log: false });
      const t = labels(lo, hi, o).filter((s) => s !== '0'); // zero is written bare beside an exponent
      const dec = new Set(t.map((s) => (s.split('e')[0]!.split('.')[1] ?? '').length));
      const exp = new Set(t.map((s) => s.split('e')[1] ?? ''));
      expect(dec.size).toBeLessThanOrEqual(1);
      expect(exp.size).toBeLessThanOrEqual(1);
    }), { seed: 1, numRuns: 1000 });
  });

  it('a log axis writes every label plain or every label with an exponent (property)', () => {
    fc.assert(fc.property(axis, (a) => {
      const { lo, hi, o } = build({ ...a, log: true });
      const t = labels(lo, hi, o);
      const sci = t.filter((s) => s.includes('e')).length;
      expect(sci === 0 || sci === t.length).toBe(true);
    }), { seed: 1, numRuns: 1000 });
  });
});

describe('chooseTicks: the cases seen on the road-power page', () => {
  it('a short log axis 0.55–1.1 gets 0.6 … 1 labels that fit (was "0.60.81")', () => {
    const t = labels(0.55, 1.1, x(200, true));
    expect(t).toContain('1');
    expect(t.length).toBeGreaterThanOrEqual(2);
    expect(t.every((s) => /^\d(\.\d+)?$/.test(s))).toBe(true);
  });

  it('decades only on a long-range narrow axis, 2 and 5 added where there is room', () => {
    expect(labels(0.1, 100, x(120, true))).toEqual(['0.1', '1', '10', '100']);
    expect(labels(0.1, 100, x(420, true))).toEqual(['0.1', '0.2', '0.5', '1', '2', '5', '10', '20', '50', '100']);
  });

  it('many decades thin out to every second or third decade and use one exponent format', () => {
    const t = labels(1e-9, 1e3, x(300, true));
    expect(t.every((s) => /^1e-?\d+$/.test(s))).toBe(true);
    expect(t.length).toBeLessThan(13);
  });

  it('a power axis to 150 kW is written in one shared exponent (was "100000 50000")', () => {
    expect(linearLabels([0, 50000, 100000, 150000], 50000)).toEqual(['0', '50e3', '100e3', '150e3']);
    expect(linearLabels([0, 0.5, 1, 1.5], 0.5)).toEqual(['0.0', '0.5', '1.0', '1.5']);
    expect(logLabels([1e-7, 1e-6, 1e-5])).toEqual(['1e-7', '1e-6', '1e-5']);
    expect(logLabels([0.6, 0.8, 1])).toEqual(['0.6', '0.8', '1']);
  });

  it('linear steps are 1, 2 or 5 times a power of ten, and niceRange ends on whole steps', () => {
    const t = chooseTicks(2.5, 40, x(420, false)).map((v) => v.value);
    const step = t[1]! - t[0]!;
    expect([1, 2, 5]).toContain(Number((step / 10 ** Math.floor(Math.log10(step))).toPrecision(6)));
    const r = niceRange(2.5, 41, x(420, false));
    expect(r.lo).toBeLessThanOrEqual(2.5);
    expect(r.hi).toBeGreaterThanOrEqual(41);
    expect(niceRange(2.5, 41, x(420, false), { lo: true, hi: true })).toEqual({ lo: 2.5, hi: 41 });
  });
});

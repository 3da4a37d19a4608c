/**
 * Polyline simplification of the static (server-drawn) charts: the drawn line may move by at most
 * the tolerance, end points stay, and peaks survive. Douglas & Peucker, The Canadian Cartographer
 * 10(2), 1973 (from memory) defines the method; the checks are its defining property.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { simplifyPolyline } from '../../src/components/render/polyline.ts';

/** Distance from (px, py) to the segment a–b. */
function segDist(px: number, py: number, ax: number, ay: number, bx: number, by: number): number {
  const dx = bx - ax; const dy = by - ay;
  const l2 = dx * dx + dy * dy;
  const t = l2 > 0 ? Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / l2)) : 0;
  return Math.hypot(px - (ax + t * dx), py - (ay + t * dy));
}

describe('simplifyPolyline', () => {
  it('keeps every dropped point within the tolerance of the kept line, and keeps both ends', () => {
    fc.assert(fc.property(fc.array(fc.double({ min: -500, max: 500, noNaN: true }), { minLength: 3, maxLength: 300 }), fc.double({ min: 0.05, max: 5, noNaN: true }), (y, tol) => {
      const x = y.map((_, i) => i * 1.3);
      const kept = simplifyPolyline(x, y, tol);
      if (kept[0] !== 0 || kept[kept.length - 1] !== y.length - 1) return false;
      for (let k = 0; k + 1 < kept.length; k++) {
        const a = kept[k]!; const b = kept[k + 1]!;
        for (let i = a + 1; i < b; i++) if (segDist(x[i]!, y[i]!, x[a]!, y[a]!, x[b]!, y[b]!) > tol + 1e-9) return false;
      }
      return true;
    }), { seed: 1, numRuns: 2000 });
  });

  it('measures a dropped point to the drawn segment, not the line through it (a steep chord once hid a point beyond its end)', () => {
    // chord from (0, 0) to (1, 100): the point (2, 200.5) lies 0.005 px from the line but 100 px beyond the end
    const kept = simplifyPolyline([0, 2, 1.0001], [0, 200.5, 100], 0.25);
    expect(kept).toContain(1);
  });

  it('keeps a one-sample spike that every-n-th thinning would lose', () => {
    const x = Array.from({ length: 4000 }, (_, i) => i * 0.1);
    const y = x.map((_, i) => (i === 1234 ? 100 : 0));
    expect(simplifyPolyline(x, y, 0.25)).toContain(1234);
  });

  it('draws a smooth decaying cosine with far fewer points than samples', () => {
    const x = Array.from({ length: 400 }, (_, i) => 56 + i);
    const y = x.map((_, i) => 116 + 100 * Math.exp(-i / 150) * Math.cos(i / 12));
    const kept = simplifyPolyline(x, y, 0.25);
    expect(kept.length).toBeLessThan(150);
  });
});

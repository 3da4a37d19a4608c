import fc from 'fast-check';
import { simplifyPolyline } from './src/components/internal/polyline.ts';
function segDist(px: number, py: number, ax: number, ay: number, bx: number, by: number): number {
  const dx = bx - ax; const dy = by - ay; const l2 = dx * dx + dy * dy;
  const t = l2 > 0 ? Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / l2)) : 0;
  return Math.hypot(px - (ax + t * dx), py - (ay + t * dy));
}
const r = fc.check(fc.property(fc.array(fc.double({ min: -500, max: 500, noNaN: true }), { minLength: 3, maxLength: 300 }), fc.double({ min: 0.05, max: 5, noNaN: true }), (y, tol) => {
  const x = y.map((_, i) => i * 1.3);
  const kept = simplifyPolyline(x, y, tol);
  if (kept[0] !== 0 || kept[kept.length - 1] !== y.length - 1) return false;
  for (let k = 0; k + 1 < kept.length; k++) { const a = kept[k]!; const b = kept[k + 1]!;
    for (let i = a + 1; i < b; i++) if (segDist(x[i]!, y[i]!, x[a]!, y[a]!, x[b]!, y[b]!) > tol + 1e-9) return false; }
  return true;
}), { numRuns: 20000 });
console.log(r.failed, JSON.stringify(r.counterexample));

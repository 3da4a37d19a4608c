/**
 * Ramer–Douglas–Peucker simplification of a polyline in drawing units (pixels): keeps the end
 * points and every point farther than `tol` from the chord of its span, so the drawn line moves
 * by at most `tol` (peaks survive, unlike taking every n-th point). Iterative: no recursion depth.
 *
 * Source: Douglas & Peucker, "Algorithms for the reduction of the number of points required to
 * represent a digitized line or its caricature", The Canadian Cartographer 10(2), 1973 (from memory).
 */
export function simplifyPolyline(xs: readonly number[], ys: readonly number[], tol: number): number[] {
  const n = Math.min(xs.length, ys.length);
  if (n <= 2) return Array.from({ length: n }, (_, i) => i);
  const keep = new Uint8Array(n);
  keep[0] = 1;
  keep[n - 1] = 1;
  const stack: [number, number][] = [[0, n - 1]];
  while (stack.length) {
    const [a, b] = stack.pop()!;
    const ax = xs[a]!; const ay = ys[a]!;
    const dx = xs[b]! - ax; const dy = ys[b]! - ay;
    const l2 = dx * dx + dy * dy;
    let far = -1;
    let worst = tol;
    for (let i = a + 1; i < b; i++) {
      // distance to the chord as drawn, a segment: a point whose foot falls beyond an end is
      // measured to that end (the distance to the infinite line let a steep chord hide it)
      const t = l2 > 0 ? Math.max(0, Math.min(1, ((xs[i]! - ax) * dx + (ys[i]! - ay) * dy) / l2)) : 0;
      const d = Math.hypot(xs[i]! - (ax + t * dx), ys[i]! - (ay + t * dy));
      if (d > worst) { worst = d; far = i; }
    }
    if (far >= 0) { keep[far] = 1; stack.push([a, far], [far, b]); }
  }
  const out: number[] = [];
  for (let i = 0; i < n; i++) if (keep[i]) out.push(i);
  return out;
}

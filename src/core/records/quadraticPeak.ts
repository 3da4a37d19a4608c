export interface QuadraticPeak {
  /** abscissa of the vertex */ readonly t: number;
  /** ordinate of the vertex */ readonly y: number;
  /** RMS residual of the fit (noise estimate), same unit as y */ readonly rms: number;
  /** true when the parabola was usable; false means the raw sample extremum was returned */ readonly fitted: boolean;
}

/**
 * Refines an extremum of sampled data by a least-squares parabola through the points of a window
 * (uneven spacing allowed). Averaging over the window removes most of the upward bias that
 * noise gives the largest raw sample.
 *
 * $$y \approx a + b\,(t-t_0) + c\,(t-t_0)^2,\qquad t^* = t_0 - \frac{b}{2c},\quad y^* = a - \frac{b^2}{4c}$$
 *
 * Falls back to the largest-|y| sample when there are fewer than 3 points, the curvature has
 * the wrong sign for the extremum, or the vertex leaves the window.
 *
 * @param t sample times of the window (increasing)
 * @param y samples
 * @param sign +1 for a maximum, −1 for a minimum
 * @example quadraticPeak([-1, 0, 1], [0, 1, 0], 1) // { t: 0, y: 1, ... }
 * @source press2007 §15.4 (general linear least squares; normal equations solved directly)
 */
export function quadraticPeak(t: readonly number[], y: readonly number[], sign: 1 | -1): QuadraticPeak {
  let best = 0;
  for (let i = 1; i < y.length; i++) if (sign * y[i]! > sign * y[best]!) best = i;
  const raw: QuadraticPeak = { t: t[best]!, y: y[best]!, rms: 0, fitted: false };
  const n = t.length;
  if (n < 3) return raw;
  const t0 = t[best]!;
  const span = Math.max(Math.abs(t[0]! - t0), Math.abs(t[n - 1]! - t0)) || 1;
  // normal equations in the scaled variable u = (t − t0)/span for conditioning
  let s0 = 0, s1 = 0, s2 = 0, s3 = 0, s4 = 0, r0 = 0, r1 = 0, r2 = 0;
  for (let i = 0; i < n; i++) {
    const u = (t[i]! - t0) / span;
    const u2 = u * u;
    s0 += 1; s1 += u; s2 += u2; s3 += u2 * u; s4 += u2 * u2;
    r0 += y[i]!; r1 += u * y[i]!; r2 += u2 * y[i]!;
  }
  const det = s0 * (s2 * s4 - s3 * s3) - s1 * (s1 * s4 - s2 * s3) + s2 * (s1 * s3 - s2 * s2);
  if (!(Math.abs(det) > 1e-12 * Math.max(1, s0 * s2 * s4))) return raw;
  const a = (r0 * (s2 * s4 - s3 * s3) - s1 * (r1 * s4 - r2 * s3) + s2 * (r1 * s3 - r2 * s2)) / det;
  const b = (s0 * (r1 * s4 - r2 * s3) - r0 * (s1 * s4 - s2 * s3) + s2 * (s1 * r2 - s2 * r1)) / det;
  const c = (s0 * (s2 * r2 - s3 * r1) - s1 * (s1 * r2 - s2 * r1) + r0 * (s1 * s3 - s2 * s2)) / det;
  if (!(sign * c < 0)) return raw;
  const uStar = -b / (2 * c);
  const uMin = (t[0]! - t0) / span;
  const uMax = (t[n - 1]! - t0) / span;
  if (uStar < uMin || uStar > uMax) return raw;
  let sse = 0;
  for (let i = 0; i < n; i++) {
    const u = (t[i]! - t0) / span;
    sse += (y[i]! - a - b * u - c * u * u) ** 2;
  }
  return { t: t0 + uStar * span, y: a - (b * b) / (4 * c), rms: n > 3 ? Math.sqrt(sse / (n - 3)) : 0, fitted: true };
}

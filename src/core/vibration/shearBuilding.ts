/**
 * Fundamental mode of a shear building: lumped floor masses m_i on storeys of lateral stiffness
 * k_i (storey 1 between the ground and floor 1, storey N under the roof), floors rigid in bending.
 */
import { ComputationError, InputRangeError, POSITIVE, requireInRange } from '../errors.ts';

export interface ShearBuildingMode {
  /** Circular frequency ω₁² (rad/s)² and period T₁ = 2π/ω₁, s. */
  readonly omega2: number;
  readonly T: number;
  /** Mode shape at floors 1..N, scaled so the roof (floor N) is 1. */
  readonly phi: readonly number[];
}

/** Most storeys accepted (the matrices are tridiagonal; the limit only bounds a hostile paste). */
export const MAX_STOREYS = 200;

/**
 * Number of generalized eigenvalues of (K, M) below λ: the negative pivots of the LDLᵀ
 * factorisation of the tridiagonal K − λM (Sylvester's law of inertia; Sturm count).
 */
function countBelow(m: readonly number[], k: readonly number[], lambda: number): number {
  const n = m.length;
  let count = 0;
  let d = 1;
  for (let i = 0; i < n; i++) {
    const diag = k[i]! + (i + 1 < n ? k[i + 1]! : 0) - lambda * m[i]!;
    const off = i > 0 ? k[i]! : 0; // |K(i, i−1)| = k_i (storey i joins floors i−1 and i)
    d = diag - (i > 0 ? (off * off) / d : 0);
    if (d === 0) d = -Number.EPSILON * Math.abs(diag || 1); // on an eigenvalue: count it as below
    if (d < 0) count++;
  }
  return count;
}

/** Solves (K − σM)x = b for a symmetric positive definite tridiagonal K − σM (Thomas algorithm). */
function solveShifted(m: readonly number[], k: readonly number[], sigma: number, b: readonly number[]): number[] {
  const n = m.length;
  const c = new Array<number>(n).fill(0);
  const y = new Array<number>(n).fill(0);
  let prevOff = 0;
  for (let i = 0; i < n; i++) {
    const diag = k[i]! + (i + 1 < n ? k[i + 1]! : 0) - sigma * m[i]!;
    const sub = i > 0 ? -k[i]! : 0;
    const den = diag - sub * prevOff;
    const sup = i + 1 < n ? -k[i + 1]! : 0;
    c[i] = sup / den;
    y[i] = (b[i]! - sub * (i > 0 ? y[i - 1]! : 0)) / den;
    prevOff = c[i]!;
  }
  const x = new Array<number>(n).fill(0);
  for (let i = n - 1; i >= 0; i--) x[i] = y[i]! - c[i]! * (i + 1 < n ? x[i + 1]! : 0);
  return x;
}

/**
 * Fundamental frequency and mode shape of a shear building, (K − ω²M)φ = 0 with
 *
 * $$K_{ii} = k_i + k_{i+1},\quad K_{i,i+1} = K_{i+1,i} = -k_{i+1}\ (k_{N+1} = 0),\qquad M = \mathrm{diag}(m_i)$$
 *
 * ω₁² by bisection on the Sturm count of K − λM (to round-off), φ by inverse iteration just below
 * ω₁², where K − σM is positive definite, so the tridiagonal solve needs no pivoting.
 *
 * @param m floor masses, kg, bottom floor first, each > 0 (1 to MAX_STOREYS floors)
 * @param k storey stiffnesses, N/m, storey 1 (ground to floor 1) first, each > 0
 * @throws InputRangeError naming `m[i]`/`k[i]` for a bad value or a length mismatch
 * @example shearBuildingMode([2, 1], [2, 1]).phi // [0.5, 1] (Chopra Example 10.4 with m = k = 1)
 * @source chopra2017 §10.2–10.4 and Example 10.4 (two-storey frame m₁ = 2m, k₁ = 2k: ω₁² = k/(2m), φ₁ = [½, 1]; from memory, checked by hand)
 */
export function shearBuildingMode(m: readonly number[], k: readonly number[]): ShearBuildingMode {
  if (m.length < 1 || m.length > MAX_STOREYS) throw new InputRangeError('m', `${m.length} floors`, { min: 1, max: MAX_STOREYS }, '');
  if (k.length !== m.length) throw new InputRangeError('k', `${k.length} storeys`, undefined, '', `one stiffness per floor mass (${m.length})`);
  m.forEach((v, i) => requireInRange(`m[${i + 1}]`, v, POSITIVE, 'kg'));
  k.forEach((v, i) => requireInRange(`k[${i + 1}]`, v, POSITIVE, 'N/m'));
  // Gershgorin bound on the eigenvalues of M⁻¹K
  let hi = 0;
  for (let i = 0; i < m.length; i++) hi = Math.max(hi, (2 * k[i]! + 2 * (k[i + 1] ?? 0)) / m[i]!);
  let lo = 0;
  for (let it = 0; it < 2000 && hi - lo > 4 * Number.EPSILON * hi; it++) {
    const mid = 0.5 * (lo + hi);
    if (countBelow(m, k, mid) >= 1) hi = mid; else lo = mid;
  }
  const omega2 = 0.5 * (lo + hi);
  if (!(omega2 > 0) || !Number.isFinite(omega2)) throw new ComputationError('no fundamental frequency found for these storeys (stiffness and mass ratios beyond double precision)');
  const sigma = lo * (1 - 1e-9);
  let x: number[] = m.map((_, i) => i + 1);
  for (let it = 0; it < 4; it++) {
    x = solveShifted(m, k, sigma, x.map((v, i) => v * m[i]!));
    const top = x[x.length - 1]!;
    if (!(Math.abs(top) > 0) || !Number.isFinite(top)) throw new ComputationError('inverse iteration failed for the fundamental mode');
    x = x.map((v) => v / top);
  }
  return { omega2, T: (2 * Math.PI) / Math.sqrt(omega2), phi: x };
}

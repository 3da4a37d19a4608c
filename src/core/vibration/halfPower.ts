import { InputRangeError, POSITIVE, requireInRange } from '../errors.ts';

/** Which response the half-power points were read from. */
export type HalfPowerResponse = 'displacement' | 'velocity' | 'acceleration';

export interface HalfPowerResult {
  /** damping ratio, exact for the stated convention */ readonly zeta: number;
  /** small-damping estimate (f2 − f1)/(2 fp) */ readonly zetaSmall: number;
  /** undamped natural frequency, Hz */ readonly fn: number;
  /** quality factor 1/(2ζ) */ readonly Q: number;
}

/**
 * Damping ratio from the half-power bandwidth of a measured resonance, the half-power points
 * taken where the response is the peak value over √2 (M_max/√2 convention).
 *
 * Displacement response (receptance): with $g = (f_2^2-f_1^2)/f_p^2$ the exact relation is
 * $$g = \frac{4\zeta\sqrt{1-\zeta^2}}{1-2\zeta^2}\;\Rightarrow\;\zeta^2 = \tfrac12\left(1-\frac{2}{\sqrt{g^2+4}}\right),\qquad f_n = \frac{f_p}{\sqrt{1-2\zeta^2}}$$
 * Acceleration response (accelerance) $r^2M$ has the receptance's form in $1/r^2$, so the same
 * relation holds with $g = f_p^2(1/f_1^2 - 1/f_2^2)$ and $f_n = f_p\sqrt{1-2\zeta^2}$.
 * Velocity response (mobility): the peak is at f_n and the relation is exact without
 * approximation: $$\zeta = \frac{f_2-f_1}{2 f_p},\qquad f_p^2 = f_1 f_2.$$
 * The lower point exists only for ζ < sin(π/8) ≈ 0.383. Both tend to the small-damping form $\zeta \approx (f_2-f_1)/(2f_p)$.
 *
 * @param f1 lower half-power frequency, Hz, 0 < f1 < fp
 * @param f2 upper half-power frequency, Hz, f2 > fp
 * @param fp peak frequency, Hz
 * @param response 'displacement' (default), 'velocity' or 'acceleration'
 * @throws InputRangeError naming f1 or f2 when they do not bracket fp
 * @example halfPowerDamping(0.946111, 1.046363, 0.997497).zeta // 0.05
 * @source ewins2000 §2.6 (half-power points; section from memory); derivation from rao2017
 *   §3.4 magnification factor, solving M(r) = M_max/√2 for r² (closed form; section from memory)
 */
export function halfPowerDamping(f1: number, f2: number, fp: number, response: HalfPowerResponse = 'displacement'): HalfPowerResult {
  requireInRange('f1', f1, POSITIVE, 'Hz');
  requireInRange('f2', f2, POSITIVE, 'Hz');
  requireInRange('fp', fp, POSITIVE, 'Hz');
  if (f1 >= fp) throw new InputRangeError('f1', f1, { min: 0, max: fp, minExclusive: true, maxExclusive: true }, 'Hz', 'must lie below the peak frequency fp');
  if (f2 <= fp) throw new InputRangeError('f2', f2, { min: fp, max: Infinity, minExclusive: true, maxExclusive: true }, 'Hz', 'must lie above the peak frequency fp');
  const zetaSmall = (f2 - f1) / (2 * fp);
  let zeta: number;
  let fn: number;
  if (response === 'velocity') {
    zeta = zetaSmall;
    fn = fp;
  } else {
    const g = response === 'acceleration' ? fp * fp * (1 / (f1 * f1) - 1 / (f2 * f2)) : (f2 * f2 - f1 * f1) / (fp * fp);
    zeta = Math.sqrt(0.5 * (1 - 2 / Math.sqrt(g * g + 4)));
    fn = response === 'acceleration' ? fp * Math.sqrt(1 - 2 * zeta * zeta) : fp / Math.sqrt(1 - 2 * zeta * zeta);
  }
  return { zeta, zetaSmall, fn, Q: 1 / (2 * zeta) };
}

/**
 * The peak frequency an SDOF resonance must have for the given half-power points — a check on
 * the readings (a wrong response type or a neighbouring mode shows as a mismatch). Exact under
 * the M_max/√2 convention, from the roots $r_{1,2}^2 = 1-2\zeta^2 \mp 2\zeta\sqrt{1-\zeta^2}$:
 * $$f_p^2 = \tfrac12(f_1^2+f_2^2)\ \text{(displacement)},\qquad f_p^2 = f_1 f_2\ \text{(velocity)},\qquad
 *   f_p^{-2} = \tfrac12(f_1^{-2}+f_2^{-2})\ \text{(acceleration)}$$
 *
 * @param f1 lower half-power frequency, Hz, (0, f2)
 * @param f2 upper half-power frequency, Hz
 * @returns the implied peak frequency, Hz
 * @example halfPowerPeakFrequency(0.946111, 1.046363) // 0.997497
 * @source rao2017 §3.4 magnification factor, solving M(r) = M_max/√2 for r² (closed form; section from memory)
 */
export function halfPowerPeakFrequency(f1: number, f2: number, response: HalfPowerResponse = 'displacement'): number {
  requireInRange('f1', f1, POSITIVE, 'Hz');
  requireInRange('f2', f2, POSITIVE, 'Hz');
  if (response === 'velocity') return Math.sqrt(f1 * f2);
  if (response === 'acceleration') return 1 / Math.sqrt((1 / (f1 * f1) + 1 / (f2 * f2)) / 2);
  return Math.sqrt((f1 * f1 + f2 * f2) / 2);
}

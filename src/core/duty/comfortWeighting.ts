/**
 * Frequency weightings of whole-body vibration (ISO 2631-1:1997 Annex A) as squared magnitudes:
 * band limiting (second-order Butterworth high and low pass), the acceleration–velocity
 * transition and the upward step. W_k: vertical, seated, standing or lying; W_d: horizontal
 * (fore-and-aft and lateral) seated, standing or lying.
 */

/** Filter parameters of one weighting, Hz (ISO 2631-1 Table A.2; values from memory, see each). */
export interface WeightingFilter {
  readonly f1: number; readonly f2: number; readonly f3: number; readonly f4: number; readonly Q4: number;
  /** Upward step (W_k only). */
  readonly step?: { readonly f5: number; readonly Q5: number; readonly f6: number; readonly Q6: number };
}

/** W_k, vertical (z) direction. ISO 2631-1:1997 Table A.2 (from memory; the filter reproduces Table 3). */
export const WEIGHTING_WK: WeightingFilter = { f1: 0.4, f2: 100, f3: 12.5, f4: 12.5, Q4: 0.63, step: { f5: 2.37, Q5: 0.91, f6: 3.35, Q6: 0.91 } };
/** W_d, horizontal (x, y) directions. ISO 2631-1:1997 Table A.2 (from memory). */
export const WEIGHTING_WD: WeightingFilter = { f1: 0.4, f2: 100, f3: 2, f4: 2, Q4: 0.63 };

/** |1 + s/(Qω₀) + s²/ω₀²|² at s = jω, in terms of r = f/f₀. */
const quad2 = (r: number, Q: number) => (1 - r * r) ** 2 + (r / Q) ** 2;

/**
 * Squared magnitude of the weighting at frequency f (s = j2πf):
 *
 * $$|H_h|^2 = \frac{1}{1 + (f_1/f)^4},\quad |H_l|^2 = \frac{1}{1 + (f/f_2)^4},\quad
 *   |H_t|^2 = \frac{1 + (f/f_3)^2}{(1 - (f/f_4)^2)^2 + (f/(Q_4 f_4))^2},$$
 * $$|H_s|^2 = \left(\frac{f_5}{f_6}\right)^4\frac{(1 - (f/f_5)^2)^2 + (f/(Q_5 f_5))^2}{(1 - (f/f_6)^2)^2 + (f/(Q_6 f_6))^2},
 *   \qquad |W|^2 = |H_h H_l H_t H_s|^2$$
 *
 * the magnitudes of H_h = 1/(1 + √2ω₁/s + ω₁²/s²), H_l = 1/(1 + √2s/ω₂ + s²/ω₂²),
 * H_t = (1 + s/ω₃)/(1 + s/(Q₄ω₄) + s²/ω₄²) and H_s = (1 + s/(Q₅ω₅) + s²/ω₅²)(ω₅/ω₆)²/(1 + s/(Q₆ω₆) + s²/ω₆²).
 *
 * @param w the weighting (WEIGHTING_WK, WEIGHTING_WD)
 * @param f frequency, Hz, ≥ 0 (0 gives 0)
 * @example Math.sqrt(weightingSquared(WEIGHTING_WK, 6.3)) // 1.054 (ISO 2631-1 Table 3 gives 1.054 at 6.3 Hz, from memory)
 * @source iso2631_1 Annex A, eqs. A.1–A.4 and Table A.2 (equation numbers from memory)
 */
export function weightingSquared(w: WeightingFilter, f: number): number {
  if (!(f > 0)) return 0;
  const hh = 1 / (1 + (w.f1 / f) ** 4);
  const hl = 1 / (1 + (f / w.f2) ** 4);
  const ht = (1 + (f / w.f3) ** 2) / quad2(f / w.f4, w.Q4);
  const s = w.step;
  const hs = s ? ((s.f5 / s.f6) ** 4 * quad2(f / s.f5, s.Q5)) / quad2(f / s.f6, s.Q6) : 1;
  return hh * hl * ht * hs;
}

/**
 * A zero-mean Gaussian damper stroke described by its spectrum: the RMS stroke and velocity, the
 * rate of zero up-crossings (cycles) and the rate at which the seals see travel. Rice's results
 * hold for any stationary Gaussian process; a narrow band at f_n is the usual case for wind sway
 * of a building mode, a tuned mass damper or a lightly damped suspension mode.
 */
import { ComputationError, InputRangeError, POSITIVE, requireInRange } from '../errors.ts';

export interface RandomStroke {
  /** RMS stroke σ_x, m. */
  readonly sigmaX: number;
  /** RMS stroke velocity σ_v, m/s. */
  readonly sigmaV: number;
  /** Zero up-crossings per second ν₀ = σ_v/(2πσ_x), Hz: one per cycle. */
  readonly nu0: number;
  /** Mean travel rate E|v| = √(2/π)·σ_v, m/s. */
  readonly travelRate: number;
}

function fromSigmas(sigmaX: number, sigmaV: number): RandomStroke {
  return { sigmaX, sigmaV, nu0: sigmaV / (2 * Math.PI * sigmaX), travelRate: Math.sqrt(2 / Math.PI) * sigmaV };
}

/**
 * Narrow-band stroke: all of the variance at f_n.
 *
 * $$\sigma_v = 2\pi f_n\,\sigma_x,\qquad \nu_0^+ = \frac{1}{2\pi}\frac{\sigma_v}{\sigma_x} = f_n,\qquad E|v| = \sqrt{2/\pi}\,\sigma_v$$
 *
 * @param sigmaX RMS stroke, m, (0, ∞)
 * @param fn frequency of the band, Hz, (0, ∞)
 * @throws InputRangeError naming sigmaX or fn
 * @example narrowBandStroke(0.002, 0.2) // { sigmaV: 2.51327e-3, travelRate: 2.00530e-3 }
 * @source rice1944 §3.3, expected number of zeros per second (from memory); newland1993 ch. 8, eq. 8.18 level crossings (equation number from memory)
 */
export function narrowBandStroke(sigmaX: number, fn: number): RandomStroke {
  requireInRange('sx', sigmaX, POSITIVE, 'm');
  requireInRange('fn', fn, POSITIVE, 'Hz');
  return fromSigmas(sigmaX, 2 * Math.PI * fn * sigmaX);
}

/**
 * Stroke from a one-sided displacement PSD S_x(f) given at points (trapezoids between them, zero
 * outside):
 *
 * $$\sigma_x^2 = \int S_x\,df,\qquad \sigma_v^2 = \int (2\pi f)^2 S_x\,df,\qquad \nu_0^+ = \frac{\sigma_v}{2\pi\sigma_x}$$
 *
 * @param f frequencies, Hz, strictly rising, ≥ 0, at least two
 * @param S PSD values, m²/Hz, ≥ 0, not all zero
 * @throws InputRangeError naming the input `psd` and the row
 * @example spectralStroke([0.19, 0.2, 0.21], [0, 4e-4, 0]).sigmaX // 0.002
 * @source rice1944 §3.3 (from memory); newland1993 ch. 8, eq. 8.18 (from memory)
 */
export function spectralStroke(f: readonly number[], S: readonly number[]): RandomStroke {
  if (f.length < 2 || f.length !== S.length) throw new InputRangeError('psd', `${f.length} rows`, undefined, '', 'at least two rows of f, S are needed');
  let vx = 0;
  let vv = 0;
  for (let i = 0; i < f.length; i++) {
    if (!(f[i]! >= 0) || !Number.isFinite(f[i]!)) throw new InputRangeError('psd', f[i]!, { min: 0, max: Infinity, maxExclusive: true }, 'Hz', `row ${i + 1}: frequency`);
    if (!(S[i]! >= 0) || !Number.isFinite(S[i]!)) throw new InputRangeError('psd', S[i]!, { min: 0, max: Infinity, maxExclusive: true }, 'm²/Hz', `row ${i + 1}: PSD`);
    if (i === 0) continue;
    const df = f[i]! - f[i - 1]!;
    if (!(df > 0)) throw new InputRangeError('psd', f[i]!, undefined, 'Hz', `row ${i + 1}: frequencies must rise`);
    const w0 = 2 * Math.PI * f[i - 1]!;
    const w1 = 2 * Math.PI * f[i]!;
    vx += 0.5 * df * (S[i - 1]! + S[i]!);
    vv += 0.5 * df * (w0 * w0 * S[i - 1]! + w1 * w1 * S[i]!);
  }
  if (!(vx > 0) || !(vv > 0)) throw new ComputationError('the stroke PSD encloses no variance (all values zero, or only at 0 Hz)');
  if (!Number.isFinite(vv)) throw new ComputationError('the stroke PSD integral overflows');
  return fromSigmas(Math.sqrt(vx), Math.sqrt(vv));
}

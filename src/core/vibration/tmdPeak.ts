import { abs } from '../complex/index.ts';
import { tmdResponse, type TmdSystem } from './tmdResponse.ts';

export interface TmdPeak {
  /** frequency ratio ω/ω_1 of the highest primary response */ readonly beta: number;
  /** |X_1| there, per static unit */ readonly amplification: number;
  /** |X_a − X_1| there, per static unit */ readonly stroke: number;
}

/**
 * The true maximum over frequency of the primary amplification |X_1(β)| of a primary with an
 * absorber: a log-spaced scan of β over [0.05, 20] (4000 points), densified by 2000 points over
 * 1 ± max(6√μ, 0.05) where the two peaks of a tuned absorber lie (they are about √(μ/2) from 1),
 * finds every local maximum, and golden-section search refines each to a relative bracket of
 * 1e-10; the highest wins.
 *
 * @param s the two-degree-of-freedom system
 * @param load 'force' or 'base'
 * @example tmdPeak({ mu: 0.1, f: 1 / 1.1, zeta: Math.sqrt(0.3 / 8.8), zeta1: 0 }, 'force').amplification // 4.59022
 * @source press2007 §10.2 (golden-section search)
 */
export function tmdPeak(s: TmdSystem, load: 'force' | 'base'): TmdPeak {
  const h = (b: number) => abs(tmdResponse(s, b, load).x1);
  const N = 4000;
  const lo = Math.log(0.05);
  const hi = Math.log(20);
  const w = Math.max(6 * Math.sqrt(s.mu), 0.05);
  const dense = Array.from({ length: 2000 }, (_, i) => Math.max(0.05, 1 - w) + ((2 * w) * i) / 1999);
  const beta = [...Array.from({ length: N }, (_, i) => Math.exp(lo + ((hi - lo) * i) / (N - 1))), ...dense].sort((a, b) => a - b);
  const val = beta.map(h);
  let best = { beta: beta[0]!, value: val[0]! };
  for (let i = 1; i + 1 < beta.length; i++) {
    if (val[i]! >= val[i - 1]! && val[i]! >= val[i + 1]!) {
      const r = golden(h, beta[i - 1]!, beta[i + 1]!);
      if (r.value > best.value) best = r;
    }
  }
  const at = tmdResponse(s, best.beta, load);
  return { beta: best.beta, amplification: best.value, stroke: abs(at.z) };
}

const INV_PHI = (Math.sqrt(5) - 1) / 2;

function golden(g: (x: number) => number, a: number, b: number): { beta: number; value: number } {
  let c = b - INV_PHI * (b - a);
  let d = a + INV_PHI * (b - a);
  let gc = g(c);
  let gd = g(d);
  while (b - a > 1e-10 * b) {
    if (gc > gd) { b = d; d = c; gd = gc; c = b - INV_PHI * (b - a); gc = g(c); }
    else { a = c; c = d; gc = gd; d = a + INV_PHI * (b - a); gd = g(d); }
  }
  const x = 0.5 * (a + b);
  return { beta: x, value: g(x) };
}

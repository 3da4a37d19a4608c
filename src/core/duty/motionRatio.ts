/**
 * A damper mounted at a motion ratio MR (damper travel per wheel travel): the law it makes at the
 * wheel, and the RMS force it carries at its own velocity.
 */
import { POSITIVE, requireInRange } from '../errors.ts';
import { gamma } from '../numeric/index.ts';
import type { RoadDamper } from './roadDuty.ts';

/**
 * By virtual work the damper moves MR times the wheel and pushes the wheel with MR times its force
 * (power is the same at both ends):
 *
 * $$v_d = MR\,v_w,\quad F_w = MR\,F_d\ \Rightarrow\ c_w = MR^2 c_d,\qquad C_w = MR^{1+\alpha} C_d$$
 *
 * @param d the law at the damper; MR (0, ∞)
 * @throws InputRangeError naming MR
 * @example damperAtWheel({ kind: 'linear', c: 1000 }, 0.7) // { c: 490 }
 * @source dixon2007 installation motion ratio of the damper (chapter from memory); closed form (virtual work)
 */
export function damperAtWheel(d: RoadDamper, MR: number): RoadDamper {
  requireInRange('MR', MR, POSITIVE, '');
  return d.kind === 'linear' ? { kind: 'linear', c: d.c * MR * MR } : { kind: 'power', C: d.C * MR ** (1 + d.alpha), alpha: d.alpha };
}

/**
 * RMS force of a damper whose velocity is Gaussian with RMS σ_v (zero mean):
 *
 * $$F_{rms} = c\,\sigma_v\ \text{(linear)},\qquad F_{rms} = C\,\sigma_v^{\alpha}\sqrt{E|z|^{2\alpha}},\quad
 *   E|z|^{p} = \frac{2^{p/2}\,\Gamma\!\left(\frac{p+1}{2}\right)}{\sqrt\pi}$$
 *
 * @param d the law at the damper; sigmaV RMS damper velocity (0, ∞) m/s
 * @example damperForceRms({ kind: 'power', C: 800, alpha: 1 }, 0.3) // 240 N (the linear case)
 * @source abramowitz1964 eq. 26.2 (absolute moments of the normal distribution; from memory); closed form
 */
export function damperForceRms(d: RoadDamper, sigmaV: number): number {
  requireInRange('sigmaV', sigmaV, POSITIVE, 'm/s');
  if (d.kind === 'linear') return d.c * sigmaV;
  const p = 2 * d.alpha;
  return d.C * sigmaV ** d.alpha * Math.sqrt((2 ** (p / 2) * gamma((p + 1) / 2)) / Math.sqrt(Math.PI));
}

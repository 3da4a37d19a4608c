import { requireInRange } from '../errors.ts';
import { dampingRegime, type DampingRegime } from './regime.ts';

/** Parameters of a viscously damped SDOF oscillator in free motion (SI). */
export interface FreeOscillator {
  readonly m: number; // kg
  readonly k: number; // N/m
  readonly c: number; // N·s/m
  readonly x0: number; // m
  readonly v0: number; // m/s
}

/** Displacement and velocity at one instant. */
export interface State {
  readonly x: number;
  readonly v: number;
}

/**
 * Closed-form free response x(t), v(t) of m·ẍ + c·ẋ + k·x = 0 from x(0) = x0, v(0) = v0.
 *
 * Underdamped: $$x = e^{-\zeta\omega_n t}\left[x_0\cos\omega_d t + \frac{v_0+\zeta\omega_n x_0}{\omega_d}\sin\omega_d t\right]$$
 * Critical: $$x = e^{-\omega_n t}\left[x_0 + (v_0+\omega_n x_0)t\right]$$
 * Overdamped, μ = ω_n√(ζ²−1): $$x = e^{-\zeta\omega_n t}\left[x_0\cosh\mu t + \frac{v_0+\zeta\omega_n x_0}{\mu}\sinh\mu t\right]$$
 *
 * Why the cosh/sinh form: the textbook C₁e^{s₁t} + C₂e^{s₂t} divides by s₁ − s₂, which loses
 * digits just above ζ = 1; the hyperbolic form is exact there. For μt > 1 the two-exponential
 * form is used because cosh alone would overflow long before the product does.
 *
 * @returns a function of t (s, ≥ 0) giving {x (m), v (m/s)}
 * @source rao2017 §2.6.2 (section from memory); inman2014 §1.3 (section from memory)
 */
export function freeResponse(p: FreeOscillator): (t: number) => State {
  requireInRange('m', p.m, { min: 0, max: Infinity, minExclusive: true, maxExclusive: true }, 'kg');
  requireInRange('k', p.k, { min: 0, max: Infinity, minExclusive: true, maxExclusive: true }, 'N/m');
  requireInRange('c', p.c, { min: 0, max: Infinity, maxExclusive: true }, 'N·s/m');
  const { x0, v0 } = p;
  const wn = Math.sqrt(p.k / p.m);
  const zeta = p.c / (2 * Math.sqrt(p.k * p.m));
  const a = zeta * wn; // decay rate of the envelope
  const b = v0 + a * x0;
  const regime: DampingRegime = dampingRegime(zeta);

  if (regime === 'underdamped') {
    const wd = wn * Math.sqrt(1 - zeta * zeta);
    return (t) => {
      const e = Math.exp(-a * t);
      const cs = Math.cos(wd * t);
      const sn = Math.sin(wd * t);
      const x = e * (x0 * cs + (b / wd) * sn);
      const v = e * (v0 * cs - ((a * b) / wd + wd * x0) * sn);
      return { x, v };
    };
  }
  if (regime === 'critically damped') {
    return (t) => {
      const e = Math.exp(-wn * t);
      const bc = v0 + wn * x0;
      return { x: e * (x0 + bc * t), v: e * (v0 - wn * bc * t) };
    };
  }
  const mu = wn * Math.sqrt(zeta * zeta - 1);
  const s1 = -a + mu; // slow root
  const s2 = -a - mu; // fast root
  return (t) => {
    if (mu * t <= 1) {
      const e = Math.exp(-a * t);
      const ch = Math.cosh(mu * t);
      const sh = Math.sinh(mu * t);
      const x = e * (x0 * ch + (b / mu) * sh);
      const v = e * (v0 * ch + ((mu * mu * x0 - a * b) / mu) * sh);
      return { x, v };
    }
    const c1 = (v0 - s2 * x0) / (s1 - s2);
    const c2 = (s1 * x0 - v0) / (s1 - s2);
    const e1 = Math.exp(s1 * t);
    const e2 = Math.exp(s2 * t);
    return { x: c1 * e1 + c2 * e2, v: c1 * s1 * e1 + c2 * s2 * e2 };
  };
}

import type { DamperLaw } from '../dampers/index.ts';
import { InputRangeError, POSITIVE } from '../errors.ts';

/** A damper law in series with a spring, as the time simulation integrates it. */
export interface SeriesLaw {
  /** The law integrated (hysteretic replaced by its viscous equivalent). */
  readonly law: DamperLaw;
  /** Damper stroke velocity at which the law carries the force F: the inverse of the law, m/s. */
  readonly velocity: (F: number) => number;
  /** Power law with α > 1: below this damper speed the law was taken linear, m/s (0 = not used). */
  readonly vLinear: number;
}

/**
 * A damper law in series with a spring k_s (Maxwell element with any law). The damper's own
 * displacement x_d is a state; the spring carries F = k_s(z − x_d), and the same force drives the
 * damper, so its velocity is the law's inverse:
 *
 * $$\dot x_d = F_d^{-1}\big(k_s(z - x_d)\big),\qquad \dot E_D = F\,\dot x_d,\qquad E_s = \tfrac12 k z^2 + \tfrac12 k_s (z-x_d)^2$$
 *
 * Every law here except friction is strictly monotone, so the inverse exists: linear F/c; power
 * (|F|/C)^{1/α}; bilinear per direction a/c₁ below the knee force c₁v_k, v_k + (a − c₁v_k)/c₂
 * above; hysteretic as its viscous equivalent ηk/ω_ref. A power law with α > 1 has zero slope at
 * rest, so its inverse has infinite slope there; below v_ε it is taken on the chord
 * (v_ε = max(10⁻³ V_scale, (k_s/(100 ω_hi C))^{1/(α−1)}), which keeps the rate k_s/c below
 * 100 ω_hi). Friction in series with a spring is an elasto-plastic element and is not simulated.
 *
 * @param ks series stiffness, N/m, (0, ∞)
 * @param omegaRef frequency the hysteretic law is made viscous at, rad/s
 * @param vScale velocity scale of the run, m/s
 * @param omegaHi fastest circular frequency of the run, rad/s
 * @example seriesLaw({ kind: 'bilinear', rebound: { c1: 2000, c2: 500 }, compression: { c1: 1000, c2: 250 }, vknee: 0.1 }, 1e6, 10, 1, 10).velocity(300) // 0.3 m/s (200 N at the knee + 100 N on c₂)
 * @source christopoulos2006 (Maxwell model, from memory); inverse-law formulation and the chord: common practice, no source
 */
export function seriesLaw(law: DamperLaw, ks: number, omegaRef: number, vScale: number, omegaHi: number): SeriesLaw {
  switch (law.kind) {
    case 'linear': {
      const c = law.c;
      if (!(c > 0)) throw new InputRangeError('c', c, POSITIVE, 'N·s/m', 'a damper in series with a spring needs c > 0');
      return { law, velocity: (F) => F / c, vLinear: 0 };
    }
    case 'hysteretic': {
      const c = (law.eta * law.k) / omegaRef;
      return { law: { kind: 'linear', c }, velocity: (F) => F / c, vLinear: 0 };
    }
    case 'power': {
      const { C, alpha } = law;
      if (!(C > 0)) throw new InputRangeError('Fref', C, POSITIVE, 'N', 'a damper in series with a spring needs a force > 0');
      const inv = 1 / alpha;
      if (alpha <= 1) return { law, velocity: (F) => Math.sign(F) * Math.pow(Math.abs(F) / C, inv), vLinear: 0 };
      const vEps = Math.max(1e-3 * vScale, Math.pow(ks / (100 * omegaHi * C), 1 / (alpha - 1)));
      const Feps = C * Math.pow(vEps, alpha);
      return { law, velocity: (F) => (Math.abs(F) < Feps ? (F * vEps) / Feps : Math.sign(F) * Math.pow(Math.abs(F) / C, inv)), vLinear: vEps };
    }
    case 'bilinear': {
      const vk = law.vknee;
      for (const [key, c] of [['c1', law.rebound.c1], ['c2', law.rebound.c2], ['c1c', law.compression.c1], ['c2c', law.compression.c2]] as const) {
        if (!(c > 0)) throw new InputRangeError(key, c, POSITIVE, 'N·s/m', 'every bilinear slope must be > 0 for a damper in series with a spring');
      }
      const side = (a: number, s: { c1: number; c2: number }) => (a <= s.c1 * vk ? a / s.c1 : vk + (a - s.c1 * vk) / s.c2);
      return { law, velocity: (F) => (F >= 0 ? side(F, law.rebound) : -side(-F, law.compression)), vLinear: 0 };
    }
    case 'coulomb':
      throw new InputRangeError('ks', ks, undefined, 'N/m', 'a friction damper in series with a spring (an elasto-plastic element) is not simulated; leave ks empty');
  }
}

import { NON_NEGATIVE, requireInRange } from '../errors.ts';
import { dampingRatio } from './dampingRatio.ts';
import { magnificationFactor, phaseLag } from './magnification.ts';
import { naturalFrequency } from './naturalFrequency.ts';
import { baseMotionPhaseLag, relativeMotionRatio, transmissibility } from './transmissibility.ts';

/** 'force': harmonic force F0 on the mass; 'base': harmonic base displacement Y under the mount. */
export type Excitation = 'force' | 'base';

export interface ForcedSdof {
  /** mass, kg */ readonly m: number;
  /** stiffness, N/m */ readonly k: number;
  /** viscous coefficient, N·s/m */ readonly c: number;
  /** excitation frequency, Hz */ readonly f: number;
  readonly excitation: Excitation;
  /** F0 in N (force) or Y in m (base) */ readonly amplitude: number;
}

export interface ForcedResponse {
  readonly r: number; readonly zeta: number; readonly wn: number; readonly omega: number;
  /** magnification factor 1/√((1−r²)²+(2ζr)²) */ readonly M: number;
  /** absolute mass amplitude, m */ readonly X: number;
  /** phase lag of X behind the excitation, rad */ readonly phase: number;
  /** transmissibility: force to base / F0, or X / Y */ readonly TR: number;
  /** relative (spring and damper) amplitude, m */ readonly Z: number;
  /** relative velocity amplitude ωZ, m/s */ readonly vrel: number;
  /** mean damper power ½cω²Z², W */ readonly P: number;
  /** amplitude of the force through spring and damper, N */ readonly Ft: number;
}

/**
 * Steady harmonic response of a mass–spring–viscous-damper system to a force on the mass or a
 * motion of its base.
 *
 * Force: $X = \frac{F_0}{k}M$, $Z = X$, $F_T = T_R F_0$. Base: $X = T_R Y$, $Z = r^2 M Y$,
 * $F_T = Z\sqrt{k^2+(c\omega)^2}$. Both: $\dot Z = \omega Z$, $\bar P = \tfrac12 c\,\omega^2 Z^2$.
 *
 * @param p m, k > 0; c ≥ 0; f ≥ 0 Hz; amplitude ≥ 0 (N or m)
 * @throws InputRangeError for invalid inputs, and naming 'r' for an undamped system at resonance
 * @example forcedResponse({ m: 1, k: 4 * Math.PI ** 2, c: 0.4 * Math.PI, f: 1, excitation: 'force', amplitude: 4 * Math.PI ** 2 }).X // 5
 * @source rao2017 §3.4 and §3.6 (sections from memory); chopra2017 Eq. (3.8.1) for the mean power
 */
export function forcedResponse(p: ForcedSdof): ForcedResponse {
  requireInRange('f', p.f, NON_NEGATIVE, 'Hz');
  requireInRange(p.excitation === 'force' ? 'F0' : 'Y', p.amplitude, NON_NEGATIVE, p.excitation === 'force' ? 'N' : 'm');
  const wn = naturalFrequency(p.m, p.k);
  const zeta = dampingRatio(p.m, p.k, p.c);
  const omega = 2 * Math.PI * p.f;
  const r = omega / wn;
  const M = magnificationFactor(r, zeta);
  const TR = transmissibility(r, zeta);
  let X: number, Z: number, phase: number, Ft: number;
  if (p.excitation === 'force') {
    X = (p.amplitude / p.k) * M;
    Z = X;
    phase = phaseLag(r, zeta);
    Ft = TR * p.amplitude;
  } else {
    X = TR * p.amplitude;
    Z = relativeMotionRatio(r, zeta) * p.amplitude;
    phase = baseMotionPhaseLag(r, zeta);
    Ft = Z * Math.hypot(p.k, p.c * omega);
  }
  const vrel = omega * Z;
  return { r, zeta, wn, omega, M, X, phase, TR, Z, vrel, P: 0.5 * p.c * vrel * vrel, Ft };
}

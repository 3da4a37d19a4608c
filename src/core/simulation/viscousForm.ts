import type { DamperLaw } from '../dampers/index.ts';

/**
 * The law the time simulation integrates. Hysteretic damping is defined for harmonic motion only
 * (its force is in phase with velocity at one frequency), so in the time domain it is replaced by
 * the viscous damper that dissipates the same energy per cycle at a reference frequency:
 *
 * $$c_{eq} = \frac{\eta k}{\omega_{ref}}$$
 *
 * with ω_ref the excitation frequency, or ω_n in free vibration. Other laws pass through.
 *
 * @source chopra2017 §3.10 (rate-independent damping and its equivalent viscous form; from memory)
 */
export function timeDomainLaw(law: DamperLaw, omegaRef: number): DamperLaw {
  if (law.kind !== 'hysteretic') return law;
  return { kind: 'linear', c: (law.eta * law.k) / omegaRef };
}

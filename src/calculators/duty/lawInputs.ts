/**
 * Damper-law inputs shared by the duty calculators: one choice `law` and the parameters of
 * each law, shown only for that law. The power-law coefficient is entered as the force at a
 * reference velocity, so it converts between unit systems like any force (C = F_ref / v_ref^α).
 */
import type { DamperLaw, DamperLawKind } from '../../core/dampers/index.ts';
import { choice, num, type InputDef, type Values } from '../types.ts';

const LABELS: Record<DamperLawKind, string> = {
  linear: 'Linear viscous F = c·v',
  power: 'Power law F = C·|v|^α',
  coulomb: 'Dry friction F = F_f·sgn v',
  bilinear: 'Bilinear (knee), rebound / compression',
  hysteretic: 'Hysteretic (loss factor η on stiffness k)',
};

/** The law choice and every law's parameters, with `when` clauses on `law`. */
export function lawInputs(
  kinds: readonly DamperLawKind[],
  defaults: { law?: DamperLawKind; c?: number; Fref?: number; vref?: number; alpha?: number } = {},
  limits: { cMin?: number; cMax?: number; FrefMin?: number } = {},
): InputDef[] {
  const on = (k: DamperLawKind) => ({ key: 'law', is: [k] as const });
  const inputs: InputDef[] = [
    { key: 'law', label: 'Damper law', kind: 'choice', options: kinds.map((k) => ({ value: k, label: LABELS[k] })), default: defaults.law ?? kinds[0]!, help: 'How the damper force depends on its velocity.' },
  ];
  const has = (k: DamperLawKind) => kinds.includes(k);
  if (has('linear')) inputs.push({ key: 'c', label: 'Damping coefficient c', kind: 'damping', default: defaults.c ?? 980, min: limits.cMin ?? 0, max: limits.cMax ?? 1e10, minExclusive: limits.cMin === undefined, help: 'Linear viscous coefficient at the damper.', when: on('linear') });
  if (has('power')) {
    inputs.push(
      { key: 'Fref', label: 'Force at reference velocity', kind: 'force', default: defaults.Fref ?? 800, min: limits.FrefMin ?? 0, max: 1e9, minExclusive: limits.FrefMin === undefined, help: 'F_ref = C·v_ref^α. With v_ref = 1 m/s this is the coefficient C in N·(s/m)^α.', when: on('power') },
      { key: 'vref', label: 'Reference velocity', kind: 'velocity', default: defaults.vref ?? 1, min: 0, max: 100, minExclusive: true, help: 'Velocity at which F_ref is quoted.', when: on('power') },
      { key: 'alpha', label: 'Velocity exponent α', kind: 'dimensionless', default: defaults.alpha ?? 0.5, min: 0.05, max: 2, help: 'Fluid viscous dampers: 0.3–1; 1 is linear.', when: on('power') },
    );
  }
  if (has('coulomb')) inputs.push({ key: 'Ff', label: 'Friction (slip) force F_f', kind: 'force', default: 200, min: 0, max: 1e9, minExclusive: true, help: 'Force at which a friction damper slips.', when: on('coulomb') });
  if (has('bilinear')) {
    inputs.push(
      { key: 'c1', label: 'Rebound low-speed slope', kind: 'damping', default: 2500, min: 0, max: 1e10, help: 'Rebound (extension) slope below the knee.', when: on('bilinear') },
      { key: 'c2', label: 'Rebound high-speed slope', kind: 'damping', default: 1200, min: 0, max: 1e10, help: 'Rebound slope above the knee.', when: on('bilinear') },
      { key: 'c1c', label: 'Compression low-speed slope', kind: 'damping', default: 1200, min: 0, max: 1e10, help: 'Compression (bump) slope below the knee.', when: on('bilinear') },
      { key: 'c2c', label: 'Compression high-speed slope', kind: 'damping', default: 500, min: 0, max: 1e10, help: 'Compression slope above the knee.', when: on('bilinear') },
      { key: 'vknee', label: 'Knee velocity', kind: 'velocity', default: 0.1, min: 0, max: 100, minExclusive: true, help: 'Velocity where the slope changes (blow-off).', when: on('bilinear') },
    );
  }
  if (has('hysteretic')) {
    inputs.push(
      { key: 'eta', label: 'Loss factor η', kind: 'dimensionless', default: 0.1, min: 0, max: 10, minExclusive: true, help: 'Structural (hysteretic) loss factor.', when: on('hysteretic') },
      { key: 'kh', label: 'Stiffness carrying the loss k', kind: 'stiffness', default: 1e5, min: 0, max: 1e12, minExclusive: true, help: 'Storage stiffness of the element whose loss factor is η.', when: on('hysteretic') },
    );
  }
  return inputs;
}

/** Builds the chosen DamperLaw from validated SI values. */
export function lawFromValues(values: Values): DamperLaw {
  const kind = choice<DamperLawKind>(values, 'law');
  switch (kind) {
    case 'linear':
      return { kind, c: num(values, 'c') };
    case 'power': {
      const alpha = num(values, 'alpha');
      return { kind, C: num(values, 'Fref') / num(values, 'vref') ** alpha, alpha };
    }
    case 'coulomb':
      return { kind, Ff: num(values, 'Ff') };
    case 'bilinear':
      return { kind, rebound: { c1: num(values, 'c1'), c2: num(values, 'c2') }, compression: { c1: num(values, 'c1c'), c2: num(values, 'c2c') }, vknee: num(values, 'vknee') };
    case 'hysteretic':
      return { kind, eta: num(values, 'eta'), k: num(values, 'kh') };
  }
}

/** One line describing a law, for chart summaries and warnings. */
export function describeLaw(law: DamperLaw): string {
  switch (law.kind) {
    case 'linear': return `linear, c = ${law.c.toPrecision(4)} N·s/m`;
    case 'power': return `power law, C = ${law.C.toPrecision(4)} N·(s/m)^${law.alpha}, α = ${law.alpha}`;
    case 'coulomb': return `dry friction, F_f = ${law.Ff.toPrecision(4)} N`;
    case 'bilinear': return `bilinear, knee at ${law.vknee} m/s`;
    case 'hysteretic': return `hysteretic, η = ${law.eta}, k = ${law.k.toPrecision(4)} N/m`;
  }
}

/**
 * The one set of inputs that describes a damper law, used by every calculator that takes a law,
 * and the mapping from those inputs to the core DamperLaw. The keys are a CLI contract:
 *
 *   law ∈ linear | power | coulomb | bilinear | hysteretic
 *   linear: c · power: Fref, vref, alpha (C = Fref/vref^α) · coulomb: Ff
 *   bilinear: c1, c2 (rebound slopes), c1c, c2c (compression slopes), vknee · hysteretic: eta, kh
 *   ks: optional series stiffness on every law (empty = rigid)
 *
 * The power-law coefficient is entered as a force at a reference velocity so that it converts
 * between unit systems like any force; C itself has the unit N·(s/m)^α, which depends on α.
 * Positive velocity is rebound (extension), negative compression (bump).
 */
import { ALPHA_RANGE, type DamperLaw, type DamperLawKind } from '../../core/dampers/index.ts';
import { InputRangeError, POSITIVE } from '../../core/errors.ts';
import { choice, num, optNum, type InputDef, type Values } from '../types.ts';

/** Every key a law input may have, with its quantity kind (test/calculators/lawKeys.test.ts checks each calculator). */
export const LAW_KEYS = {
  law: 'choice', c: 'damping', Fref: 'force', vref: 'velocity', alpha: 'dimensionless', Ff: 'force',
  c1: 'damping', c2: 'damping', c1c: 'damping', c2c: 'damping', vknee: 'velocity', eta: 'dimensionless', kh: 'stiffness', ks: 'stiffness',
} as const;

const LABELS: Record<DamperLawKind, string> = {
  linear: 'Linear viscous F = c·v',
  power: 'Power law F = C·|v|^α, C = F_ref/v_ref^α',
  coulomb: 'Dry friction F = F_f·sgn v',
  bilinear: 'Bilinear with a knee, rebound and compression slopes',
  hysteretic: 'Hysteretic (loss factor η on stiffness k_h)',
};

/** Defaults a calculator may set (SI); the rest are the handbook's. */
export interface LawDefaults {
  readonly law?: DamperLawKind;
  readonly c?: number; readonly Fref?: number; readonly vref?: number; readonly alpha?: number; readonly Ff?: number;
  readonly c1?: number; readonly c2?: number; readonly c1c?: number; readonly c2c?: number; readonly vknee?: number;
  readonly eta?: number; readonly kh?: number;
}

export interface LawInputOptions {
  /** Laws offered, in menu order (default: all five). */
  readonly kinds?: readonly DamperLawKind[];
  readonly defaults?: LawDefaults;
  /** Narrower ranges for a calculator whose method needs them (road-power). */
  readonly limits?: { readonly cMin?: number; readonly cMax?: number; readonly FrefMin?: number };
  /** Offer the optional series stiffness `ks` (default true; false where the method has none). */
  readonly series?: boolean;
}

const ALL: readonly DamperLawKind[] = ['linear', 'power', 'coulomb', 'bilinear', 'hysteretic'];

/** The law choice and every offered law's parameters, each shown only for its law. */
export function lawInputs(opts: LawInputOptions = {}): InputDef[] {
  const kinds = opts.kinds ?? ALL;
  const d = opts.defaults ?? {};
  const lim = opts.limits ?? {};
  const on = (k: DamperLawKind) => ({ key: 'law', is: [k] as const });
  const has = (k: DamperLawKind) => kinds.includes(k);
  const inputs: InputDef[] = [
    { key: 'law', label: 'Damper law', kind: 'choice', options: kinds.map((k) => ({ value: k, label: LABELS[k] })), default: d.law ?? kinds[0]!, help: 'How the damper force depends on its stroke velocity (positive = rebound).' },
  ];
  if (has('linear')) inputs.push({ key: 'c', label: 'Damping coefficient c', kind: 'damping', default: d.c ?? 1500, min: lim.cMin ?? 0, max: lim.cMax ?? 1e10, minExclusive: lim.cMin === undefined, help: 'Linear viscous coefficient at the damper.', when: on('linear') });
  if (has('power')) {
    inputs.push(
      { key: 'Fref', label: 'Force at reference velocity F_ref', kind: 'force', default: d.Fref ?? 800, min: lim.FrefMin ?? 0, max: 1e9, minExclusive: lim.FrefMin === undefined, help: 'F_ref = C·v_ref^α. With v_ref = 1 m/s this is the coefficient C in N·(s/m)^α.', when: on('power') },
      { key: 'vref', label: 'Reference velocity v_ref', kind: 'velocity', default: d.vref ?? 1, min: 0, max: 100, minExclusive: true, help: 'Velocity at which F_ref is quoted (a dyno sheet’s rated velocity).', when: on('power') },
      { key: 'alpha', label: 'Velocity exponent α', kind: 'dimensionless', default: d.alpha ?? 0.5, min: ALPHA_RANGE.min, max: ALPHA_RANGE.max, help: 'Fluid viscous dampers: 0.3–1; 1 is linear.', when: on('power') },
    );
  }
  if (has('coulomb')) inputs.push({ key: 'Ff', label: 'Friction (slip) force F_f', kind: 'force', default: d.Ff ?? 200, min: 0, max: 1e9, minExclusive: true, help: 'Force at which a friction damper slips.', when: on('coulomb') });
  if (has('bilinear')) {
    inputs.push(
      { key: 'c1', label: 'Rebound low-speed slope c₁', kind: 'damping', default: d.c1 ?? 2500, min: 0, max: 1e10, help: 'Rebound (extension) slope below the knee.', when: on('bilinear') },
      { key: 'c2', label: 'Rebound high-speed slope c₂', kind: 'damping', default: d.c2 ?? 1200, min: 0, max: 1e10, help: 'Rebound slope above the knee, where the blow-off valves open.', when: on('bilinear') },
      { key: 'c1c', label: 'Compression low-speed slope c₁c', kind: 'damping', default: d.c1c ?? 1200, min: 0, max: 1e10, help: 'Compression (bump) slope below the knee; often 0.3–0.5 of rebound.', when: on('bilinear') },
      { key: 'c2c', label: 'Compression high-speed slope c₂c', kind: 'damping', default: d.c2c ?? 500, min: 0, max: 1e10, help: 'Compression slope above the knee.', when: on('bilinear') },
      { key: 'vknee', label: 'Knee velocity v_k', kind: 'velocity', default: d.vknee ?? 0.1, min: 0, max: 100, minExclusive: true, help: 'Stroke velocity where the slope changes (both directions).', when: on('bilinear') },
    );
  }
  if (has('hysteretic')) {
    inputs.push(
      { key: 'eta', label: 'Loss factor η', kind: 'dimensionless', default: d.eta ?? 0.1, min: 0, max: 10, minExclusive: true, help: 'Structural (hysteretic) loss factor: energy per cycle π·η·k_h·X², independent of frequency.', when: on('hysteretic') },
      { key: 'kh', label: 'Stiffness carrying the loss k_h', kind: 'stiffness', default: d.kh ?? 1e5, min: 0, max: 1e12, minExclusive: true, help: 'Storage stiffness of the element whose loss factor is η.', when: on('hysteretic') },
    );
  }
  if (opts.series ?? true) {
    inputs.push({ key: 'ks', label: 'Series stiffness k_s (optional)', kind: 'stiffness', default: 1e7, min: 0, max: 1e13, minExclusive: true, optional: true, help: 'Spring in series with the damper (brace, mounts, oil and gas compressibility), Maxwell model. Leave empty for a rigid connection.' });
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
    case 'bilinear': {
      const law = { kind, rebound: { c1: num(values, 'c1'), c2: num(values, 'c2') }, compression: { c1: num(values, 'c1c'), c2: num(values, 'c2c') }, vknee: num(values, 'vknee') };
      if (law.rebound.c1 + law.rebound.c2 + law.compression.c1 + law.compression.c2 === 0) throw new InputRangeError('c1', 0, POSITIVE, 'N·s/m', 'the four bilinear slopes cannot all be zero');
      return law;
    }
    case 'hysteretic':
      return { kind, eta: num(values, 'eta'), k: num(values, 'kh') };
  }
}

/** The optional series stiffness, N/m (undefined = rigid). */
export function seriesStiffness(values: Values): number | undefined {
  return optNum(values, 'ks');
}

/** One line describing a law, for chart legends and warnings. */
export function describeLaw(law: DamperLaw): string {
  switch (law.kind) {
    case 'linear': return `linear, c = ${law.c.toPrecision(4)} N·s/m`;
    case 'power': return `power law, C = ${law.C.toPrecision(4)} N·(s/m)^${law.alpha}, α = ${law.alpha}`;
    case 'coulomb': return `dry friction, F_f = ${law.Ff.toPrecision(4)} N`;
    case 'bilinear': return `bilinear, knee at ${law.vknee} m/s`;
    case 'hysteretic': return `hysteretic, η = ${law.eta}, k_h = ${law.k.toPrecision(4)} N/m`;
  }
}

/** The study quantity each law key means (src/studies/quantities.ts). */
export const LAW_STUDY_NAMES: Readonly<Record<keyof typeof LAW_KEYS, string>> = {
  law: 'damperLaw', c: 'dampingCoefficient', Fref: 'powerLawForce', vref: 'powerLawVelocity', alpha: 'powerLawExponent', Ff: 'frictionForce',
  c1: 'reboundLowSlope', c2: 'reboundHighSlope', c1c: 'compressionLowSlope', c2c: 'compressionHighSlope', vknee: 'kneeVelocity',
  eta: 'lossFactor', kh: 'lossStiffness', ks: 'seriesStiffness',
};

/** Study bindings of the law inputs a calculator offers (for the `study` block at the end of its definition). */
export function lawStudy(inputs: readonly InputDef[]): Record<string, string> {
  return Object.fromEntries(inputs.filter((i) => i.key in LAW_STUDY_NAMES).map((i) => [i.key, LAW_STUDY_NAMES[i.key as keyof typeof LAW_KEYS]]));
}

/**
 * Inputs that describe a damper law, shared by the energy-per-cycle and simulation calculators,
 * and the mapping from those inputs to a core DamperLaw. Keys are part of the CLI contract.
 *
 * Bilinear law as the inputs describe it: c1 (low speed) and c2 (high speed) are the slopes of a
 * reference curve with the knee at vknee; rebound (extension, v > 0) uses cRebound × that curve
 * and compression (v < 0) uses cCompression × it. Automotive dampers are usually tuned with
 * compression at roughly a third to a half of rebound (common practice, no source), so one curve
 * and two factors describe a tuning the way a damper dyno sheet is read.
 */
import type { DamperLaw, DamperLawKind } from '../../core/dampers/index.ts';
import { InputRangeError, POSITIVE } from '../../core/errors.ts';
import { choice, num, optNum, type InputDef, type Values } from '../types.ts';

const viscous = ['linear', 'power'];

/** The law inputs, with the law selected by default. */
export function lawInputs(defaultLaw: DamperLawKind): readonly InputDef[] {
  return [{ ...LAW_CHOICE, default: defaultLaw }, ...LAW_PARAMETERS];
}

const LAW_CHOICE: InputDef & { kind: 'choice' } = {
  key: 'law', label: 'Damper law', kind: 'choice', default: 'linear', required: true,
  options: [
    { value: 'linear', label: 'Linear viscous F = c·v' },
    { value: 'power', label: 'Power-law viscous F = c·|v|^α·sgn v' },
    { value: 'coulomb', label: 'Coulomb friction F = F_f·sgn v' },
    { value: 'bilinear', label: 'Bilinear with knee (rebound/compression)' },
    { value: 'hysteretic', label: 'Hysteretic (loss factor η)' },
  ],
  help: 'Force law of the damper as a function of its stroke velocity.',
};

const LAW_PARAMETERS: readonly InputDef[] = [
  {
    key: 'c', label: 'Damping coefficient c', kind: 'damping', default: 1500, min: 0, max: 1e9, minExclusive: true, required: true, when: { key: 'law', is: viscous },
    siOnlyWhen: { key: 'law', is: ['power'], why: 'the power-law C is in N·(s/m)^α, and a conversion from other units depends on α.' },
    help: 'Linear law: N·s/m (any damping unit). Power law: C in N·(s/m)^α, SI base units only (other units would convert correctly only at α = 1).',
  },
  { key: 'alpha', label: 'Velocity exponent α', kind: 'dimensionless', default: 0.5, min: 0, max: 2, minExclusive: true, when: { key: 'law', is: ['power'] }, help: 'Fluid viscous dampers in buildings: typically 0.3–1.' },
  { key: 'Ff', label: 'Friction (slip) force F_f', kind: 'force', default: 200, min: 0, max: 1e8, minExclusive: true, required: true, when: { key: 'law', is: ['coulomb'] }, help: 'Constant force opposing sliding.' },
  { key: 'c1', label: 'Low-speed coefficient c₁', kind: 'damping', default: 2000, min: 0, max: 1e9, required: true, when: { key: 'law', is: ['bilinear'] }, help: 'Slope below the knee velocity (reference curve).' },
  { key: 'c2', label: 'High-speed coefficient c₂', kind: 'damping', default: 600, min: 0, max: 1e9, required: true, when: { key: 'law', is: ['bilinear'] }, help: 'Slope above the knee velocity, where the blow-off valves open (reference curve).' },
  { key: 'vknee', label: 'Knee velocity v_k', kind: 'velocity', default: 0.1, min: 0, max: 100, minExclusive: true, when: { key: 'law', is: ['bilinear'] }, help: 'Stroke velocity where the slope changes from c₁ to c₂.' },
  { key: 'cRebound', label: 'Rebound factor', kind: 'dimensionless', default: 1, min: 0, max: 100, when: { key: 'law', is: ['bilinear'] }, help: 'Multiplies c₁ and c₂ for extension (v > 0).' },
  { key: 'cCompression', label: 'Compression factor', kind: 'dimensionless', default: 0.4, min: 0, max: 100, when: { key: 'law', is: ['bilinear'] }, help: 'Multiplies c₁ and c₂ for compression (v < 0); often 0.3–0.5 of rebound.' },
  { key: 'eta', label: 'Loss factor η', kind: 'dimensionless', default: 0.1, min: 0, max: 10, minExclusive: true, when: { key: 'law', is: ['hysteretic'] }, help: 'Hysteretic damping: energy per cycle π·η·k·X², independent of frequency.' },
];

/** Builds the core damper law from validated calculator values. `kHyst` is the stiffness the loss factor acts on. */
export function lawFromValues(values: Values, kHyst: number | undefined): DamperLaw {
  const kind = choice<DamperLawKind>(values, 'law');
  switch (kind) {
    case 'linear':
      return { kind, c: num(values, 'c') };
    case 'power':
      return { kind, C: num(values, 'c'), alpha: num(values, 'alpha') };
    case 'coulomb':
      return { kind, Ff: num(values, 'Ff') };
    case 'bilinear': {
      const c1 = num(values, 'c1');
      const c2 = num(values, 'c2');
      const r = num(values, 'cRebound');
      const cc = num(values, 'cCompression');
      if (c1 + c2 === 0) throw new InputRangeError('c1', c1, POSITIVE, 'N·s/m', 'c₁ and c₂ cannot both be zero');
      if (r + cc === 0) throw new InputRangeError('cRebound', r, POSITIVE, '', 'rebound and compression factors cannot both be zero');
      return { kind, rebound: { c1: r * c1, c2: r * c2 }, compression: { c1: cc * c1, c2: cc * c2 }, vknee: num(values, 'vknee') };
    }
    case 'hysteretic':
      if (kHyst === undefined) throw new InputRangeError('k', undefined, POSITIVE, 'N/m', 'the hysteretic law needs the stiffness k its loss factor acts on');
      return { kind, eta: num(values, 'eta'), k: kHyst };
  }
}

/** Reads the optional stiffness input. */
export function stiffness(values: Values): number | undefined {
  return optNum(values, 'k');
}

/**
 * Old damper-law keys, still accepted by the CLI (`calc`, `sheet`) and by record replay for the
 * 0.3 minor versions, mapped to the canonical keys of inputs.ts with a deprecation note:
 *
 * - `c` with law = power (C in SI, N·(s/m)^α) → Fref = C, vref = 1 m/s;
 * - `cRebound`, `cCompression` (factors on one bilinear curve c1, c2) → the four slopes
 *   c1, c2 (rebound) and c1c, c2c (compression);
 * - `k` as the stiffness of the hysteretic law on energy-per-cycle and damper-simulation → kh.
 *   On both calculators `k` also means a spring of its own (ζ_eq, the oscillator), so it stays.
 *
 * Pure: values are SI numbers or text as typed ("10 lbf·s/in"); text is read only where a value
 * must be multiplied.
 */
import { InputRangeError } from '../../core/errors.ts';
import { isPlainNumber } from '../../core/numeric/plainNumber.ts';
import { parseQuantity, type QuantityKind } from '../../core/units/index.ts';
import type { CalculatorDefinition } from '../types.ts';

/** Keys no calculator has any more, accepted for migration only, with their kinds. */
export const LEGACY_LAW_KEYS: Readonly<Record<string, QuantityKind>> = { cRebound: 'dimensionless', cCompression: 'dimensionless' };

/** Calculators whose `k` was also the stiffness the hysteretic loss factor acted on. */
const K_WAS_HYSTERETIC = new Set(['energy-per-cycle', 'damper-simulation']);

/** The old factor defaults (rebound 1, compression 0.4) and reference-curve defaults of those two calculators. */
const OLD = { cRebound: 1, cCompression: 0.4, c1: 2000, c2: 600 };

export interface Migrated {
  readonly raw: Record<string, unknown>;
  readonly notes: string[];
}

/** True when `key` is an old law key this calculator still reads. */
export function isLegacyLawKey(calc: CalculatorDefinition, key: string): boolean {
  return key in LEGACY_LAW_KEYS && calc.inputs.some((i) => i.key === 'c1c');
}

function si(key: string, v: unknown, kind: QuantityKind): number {
  if (typeof v === 'number') return v;
  if (typeof v === 'string') {
    try { return parseQuantity(v, kind); } catch (e) { throw new InputRangeError(key, v, undefined, '', e instanceof Error ? e.message : 'not a number'); }
  }
  throw new InputRangeError(key, String(v), undefined, '', 'not a number');
}

/** Maps old law keys in `raw` to the canonical ones; returns a new object and one note per mapping. */
export function migrateLawKeys(calc: CalculatorDefinition, raw: Readonly<Record<string, unknown>>): Migrated {
  const out: Record<string, unknown> = Object.assign(Object.create(null), raw);
  const notes: string[] = [];
  const has = (k: string) => calc.inputs.some((i) => i.key === k);
  if (!has('law')) return { raw: out, notes };
  const law = out.law;

  if (law === 'power' && 'c' in out && has('Fref') && !('Fref' in out)) {
    const c = out.c;
    // C was accepted in SI base units only (its unit depends on α): a plain number, or a number string
    if (typeof c === 'string' && !isPlainNumber(c)) throw new InputRangeError('c', c, undefined, '', 'the power-law C (old key) is read in SI base units only, N·(s/m)^α: give Fref and vref instead');
    const C = si('c', c, 'damping');
    delete out.c;
    out.Fref = C;
    if (!('vref' in out)) out.vref = 1;
    notes.push(`'c' with law=power is deprecated: read as Fref = ${C} N at vref = 1 m/s (C in N·(s/m)^α); give Fref and vref.`);
  }

  if ('cRebound' in out || 'cCompression' in out) {
    const given = ['cRebound', 'cCompression'].filter((k) => k in out).join(' and ');
    if (law === 'bilinear' && has('c1c')) {
      if ('c1c' in out || 'c2c' in out) throw new InputRangeError('cCompression', String(out.cCompression ?? out.cRebound), undefined, '', 'give either the old factors or the compression slopes c1c, c2c, not both');
      const r = 'cRebound' in out ? si('cRebound', out.cRebound, 'dimensionless') : OLD.cRebound;
      const cc = 'cCompression' in out ? si('cCompression', out.cCompression, 'dimensionless') : OLD.cCompression;
      const c1 = 'c1' in out ? si('c1', out.c1, 'damping') : OLD.c1;
      const c2 = 'c2' in out ? si('c2', out.c2, 'damping') : OLD.c2;
      out.c1 = r * c1; out.c2 = r * c2; out.c1c = cc * c1; out.c2c = cc * c2;
      notes.push(`${given} ${given.includes(' and ') ? 'are' : 'is'} deprecated: read as rebound slopes c1 = ${r * c1}, c2 = ${r * c2} N·s/m and compression slopes c1c = ${cc * c1}, c2c = ${cc * c2} N·s/m; give the four slopes.`);
    } else notes.push(`${given} ${given.includes(' and ') ? 'are' : 'is'} deprecated and ignored here (bilinear law only); give the four slopes c1, c2, c1c, c2c.`);
    delete out.cRebound;
    delete out.cCompression;
  }

  if (law === 'hysteretic' && K_WAS_HYSTERETIC.has(calc.id) && 'k' in out && !('kh' in out) && has('kh')) {
    out.kh = si('k', out.k, 'stiffness');
    notes.push(`'k' as the stiffness of the hysteretic law is deprecated: read as kh = ${out.kh} N/m (k keeps its other meaning); give kh.`);
  }
  return { raw: out, notes };
}

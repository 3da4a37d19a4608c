/**
 * Generators for the bad-input suite, built from each calculator's own definition so that every
 * calculator added to the registry is covered without editing the tests.
 */
import fc from 'fast-check';
import type { CalculatorDefinition, InputDef, NumberInput } from '../../src/calculators/types.ts';

// the values themselves live in src, shared with `dampbook check --content` (team calculators)
export { describeValue, HOSTILE_TEXT, HOSTILE_VALUES } from '../../src/calculators/badInput/values.ts';

/** A valid number for an input: uniform on small ranges, log-uniform on wide ones, bounds included when allowed. */
export function validNumber(def: NumberInput): fc.Arbitrary<number> {
  const lo = def.min;
  const hi = Number.isFinite(def.max) ? def.max : Math.max(1e12, Math.abs(lo) * 1e6);
  const inside = (x: number) => (def.minExclusive ? x > def.min : x >= def.min) && (def.maxExclusive ? x < def.max : x <= def.max);
  const uniform = fc.double({ min: lo, max: hi, noNaN: true, noDefaultInfinity: true });
  const parts: fc.Arbitrary<number>[] = [uniform, fc.constant(def.default)];
  if (lo >= 0 && hi > 0) {
    const a = Math.log10(lo > 0 ? lo : Math.max(hi * 1e-12, Number.MIN_VALUE));
    parts.push(fc.double({ min: a, max: Math.log10(hi), noNaN: true }).map((e) => 10 ** e));
  }
  if (!def.minExclusive && Number.isFinite(lo)) parts.push(fc.constant(lo));
  if (!def.maxExclusive && Number.isFinite(def.max)) parts.push(fc.constant(def.max));
  // the smallest step inside an exclusive bound: the "tiny" edge (e.g. a mass of 5e-324 kg)
  if (def.minExclusive) parts.push(fc.constant(lo === 0 ? Number.MIN_VALUE : lo + Math.abs(lo) * 1e-12));
  return fc.oneof(...parts).filter(inside);
}

/** A valid raw value for any input kind. */
export function validValue(def: InputDef): fc.Arbitrary<number | string> {
  if (def.kind === 'choice') return fc.constantFrom(...def.options.map((o) => o.value));
  if (def.kind === 'text') return fc.constant(def.default);
  return validNumber(def);
}

/** A record of valid raw values for every input of a calculator. */
export function validRecord(calc: CalculatorDefinition): fc.Arbitrary<Record<string, number | string>> {
  return fc.record(Object.fromEntries(calc.inputs.map((d) => [d.key, validValue(d)])) as Record<string, fc.Arbitrary<number | string>>);
}

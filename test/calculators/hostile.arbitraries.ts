/**
 * Generators for the bad-input suite, built from each calculator's own definition so that every
 * calculator added to the registry is covered without editing the tests.
 */
import fc from 'fast-check';
import type { CalculatorDefinition, InputDef, NumberInput } from '../../src/calculators/types.ts';

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

/** Values that must never crash a calculator, whatever the input kind. */
export const HOSTILE_VALUES: readonly unknown[] = [
  NaN, Infinity, -Infinity, 0, -0, -1, -1e300, 1e300, 5e-324, -5e-324, Number.MAX_VALUE, -Number.MAX_VALUE,
  '', ' ', 'abc', 'NaN', 'Infinity', '-Infinity', '1e999', '-1e999', '0x10', '1,5', '12 furlongs', '25 lb lb', '١٢',
  '<img src=x onerror=alert(1)>', '"><script>alert(1)</script>', '__proto__', 'constructor', 'toString',
  'x'.repeat(10_000_000), '1'.repeat(100_000) + 'x', `1${' '.repeat(100_000)}a b`,
  null, undefined, true, false, 12n, Symbol('x'), {}, [], [1], { valueOf: () => 3 }, Object.create(null),
  { toString() { throw new Error('hostile toString'); } }, () => 1, new Date(0),
];

/** Labels for failure messages (a 10 MB string is not printed). */
export function describeValue(v: unknown): string {
  if (typeof v === 'string') return v.length > 60 ? `string(${v.length})` : JSON.stringify(v);
  if (typeof v === 'bigint') return `${v}n`;
  if (typeof v === 'symbol' || typeof v === 'function') return typeof v;
  if (v === null || v === undefined || typeof v !== 'object') return String(v);
  return Array.isArray(v) ? 'array' : 'object';
}

/** Text payloads for text (CSV) inputs: malformed, hostile or degenerate records. */
export const HOSTILE_TEXT: readonly string[] = [
  '', '\n\n\n', 'garbage', 'a,b,c\n1,2,3', 't,x\n0,NaN\n1,Infinity', 't,x\n0,1e999\n1,-1e999', 't,x\n1,0\n0,1\n0,1',
  't,x\n0,0', 't,x\n0,0\n1,0\n2,0\n3,0', '0;1\n1;2\n2;3', '\u0000\u0001\u0002', '<img src=x onerror=alert(1)>,1\n2,3',
  '__proto__,constructor\n1,2', `t,x\n${Array.from({ length: 5000 }, (_, i) => `${i * 1e-3},${Math.sin(i)}`).join('\n')}`,
  'x'.repeat(2_000_000), '1,2\n'.repeat(300_000),
];

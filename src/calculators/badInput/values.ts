/**
 * Values that must never crash a calculator, whatever the input kind: the one list the bad-input
 * test suite (test/calculators/hostile.test.ts) and `dampbook check --content` (a team's own
 * calculators, src/team/checkTeam.ts) both drive every calculator with.
 */

export const HOSTILE_VALUES: readonly unknown[] = [
  NaN, Infinity, -Infinity, 0, -0, -1, -1e300, 1e300, 5e-324, -5e-324, Number.MAX_VALUE, -Number.MAX_VALUE,
  '', ' ', 'abc', 'NaN', 'Infinity', '-Infinity', '1e999', '-1e999', '0x10', '1,5', '12 furlongs', '25 lb lb', '١٢',
  '<img src=x onerror=alert(1)>', '"><script>alert(1)</script>', '__proto__', 'constructor', 'toString',
  'x'.repeat(10_000_000), '1'.repeat(100_000) + 'x', `1${' '.repeat(100_000)}a b`,
  null, undefined, true, false, 12n, Symbol('x'), {}, [], [1], { valueOf: () => 3 }, Object.create(null),
  { toString() { throw new Error('hostile toString'); } }, () => 1, new Date(0),
];

/** Text payloads for text (CSV) inputs: malformed, hostile or degenerate records. */
export const HOSTILE_TEXT: readonly string[] = [
  '', '\n\n\n', 'garbage', 'a,b,c\n1,2,3', 't,x\n0,NaN\n1,Infinity', 't,x\n0,1e999\n1,-1e999', 't,x\n1,0\n0,1\n0,1',
  't,x\n0,0', 't,x\n0,0\n1,0\n2,0\n3,0', '0;1\n1;2\n2;3', '\u0000\u0001\u0002', '<img src=x onerror=alert(1)>,1\n2,3',
  '__proto__,constructor\n1,2', `t,x\n${Array.from({ length: 5000 }, (_, i) => `${i * 1e-3},${Math.sin(i)}`).join('\n')}`,
  'x'.repeat(2_000_000), '1,2\n'.repeat(300_000),
];

/** Labels for failure messages (a 10 MB string is not printed). */
export function describeValue(v: unknown): string {
  if (typeof v === 'string') return v.length > 60 ? `string(${v.length})` : JSON.stringify(v);
  if (typeof v === 'bigint') return `${v}n`;
  if (typeof v === 'symbol' || typeof v === 'function') return typeof v;
  if (v === null || v === undefined || typeof v !== 'object') return String(v);
  return Array.isArray(v) ? 'array' : 'object';
}

/**
 * The candidate valid numbers of an input, as the suite samples them: uniform over the range,
 * the default, log-uniform over a positive range, the closed bounds and the smallest step inside
 * an exclusive lower bound (the "tiny" edge, e.g. a mass of 5e-324 kg). `u`, `w` in [0, 1).
 */
export function sampleNumber(def: { min: number; max: number; default: number; minExclusive?: boolean | undefined; maxExclusive?: boolean | undefined }, pick: number, u: number): number {
  const lo = def.min;
  const hi = Number.isFinite(def.max) ? def.max : Math.max(1e12, Math.abs(lo) * 1e6);
  const parts: (() => number)[] = [() => lo + (hi - lo) * u, () => def.default];
  if (lo >= 0 && hi > 0) {
    const a = Math.log10(lo > 0 ? lo : Math.max(hi * 1e-12, Number.MIN_VALUE));
    parts.push(() => 10 ** (a + (Math.log10(hi) - a) * u));
  }
  if (!def.minExclusive && Number.isFinite(lo)) parts.push(() => lo);
  if (!def.maxExclusive && Number.isFinite(def.max)) parts.push(() => def.max);
  if (def.minExclusive) parts.push(() => (lo === 0 ? Number.MIN_VALUE : lo + Math.abs(lo) * 1e-12));
  return parts[Math.floor(pick * parts.length) % parts.length]!();
}

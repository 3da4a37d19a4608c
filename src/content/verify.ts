/**
 * Executable verification of a page: runs every verification case of the calculators the page
 * lists (one list per calculator, in its definition), then the page's own extra cases from its
 * frontmatter, and compares every expected output by the one comparison rule
 * (core/numeric/compare.ts). Used by the page layout (the build fails on a failing case),
 * `dampbook check` and the tests. A frontmatter case that repeats a definition's case is a problem:
 * two copies of one check drift apart (20 of 25 once had). Pure: no file system, no Astro.
 */
import { evaluate } from '../calculators/evaluate.ts';
import { getCalculator } from '../calculators/registry.ts';
import type { CalculatorDefinition, Values } from '../calculators/types.ts';
import { relativeDifference } from '../core/numeric/index.ts';
import type { PageMeta, PageVerificationCase } from './schema.ts';

/** One compared output of one case. */
export interface CheckRow {
  readonly case: string;
  readonly calculator: string;
  readonly output: string;
  readonly expected: number | string;
  readonly computed: number | string | undefined;
  /** Relative difference (absolute when the expected value is 0); undefined for text outputs. */
  readonly difference: number | undefined;
  readonly tolerance: number;
  readonly pass: boolean;
  /** Why the case could not run (unknown calculator, bad input, missing output). */
  readonly error?: string;
  readonly source: PageVerificationCase['source'];
  readonly provenance: string;
}

export interface PageVerification {
  readonly rows: readonly CheckRow[];
  readonly failures: readonly CheckRow[];
  /** Page-level problems: a listed calculator that does not exist. */
  readonly problems: readonly string[];
}

/** |computed − expected| / |expected|, or the absolute difference when expected is 0. */
export const difference = relativeDifference;

export function runCase(c: PageVerificationCase): CheckRow[] {
  const base = { case: c.name, calculator: c.calculator, tolerance: c.tolerance, source: c.source, provenance: c.provenance };
  const fail = (output: string, expected: number | string, error: string): CheckRow =>
    ({ ...base, output, expected, computed: undefined, difference: undefined, pass: false, error });
  const calc = getCalculator(c.calculator);
  if (!calc) return [fail('—', '—', `no calculator has the id '${c.calculator}'`)];
  let outputs: Record<string, number | string | undefined>;
  try {
    outputs = evaluate(calc, c.inputs).outputs;
  } catch (e) {
    return [fail('—', '—', e instanceof Error ? e.message : String(e))];
  }
  return Object.entries(c.expected).map(([key, expected]): CheckRow => {
    if (!calc.outputs.some((o) => o.key === key)) return fail(key, expected, `calculator ${calc.id} has no output '${key}'`);
    const computed = outputs[key];
    if (computed === undefined) return fail(key, expected, `calculator ${calc.id} gives no '${key}' for these inputs`);
    if (typeof expected === 'string' || typeof computed === 'string') {
      return { ...base, output: key, expected, computed, difference: undefined, pass: String(computed) === String(expected) };
    }
    const diff = difference(computed, expected);
    return { ...base, output: key, expected, computed, difference: diff, pass: diff <= c.tolerance };
  });
}

/** A definition's cases as page cases (with the calculator id), in the definition's order. */
export function definitionCases(calc: CalculatorDefinition): PageVerificationCase[] {
  const defined = (o: Values) => Object.fromEntries(Object.entries(o).filter((e): e is [string, number | string] => e[1] !== undefined));
  return calc.verification.map((v) => ({ ...v, inputs: defined(v.inputs), calculator: calc.id }));
}

/** The name of the definition case a page case repeats (same calculator, same inputs), if any. */
export function repeatedCase(c: PageVerificationCase): string | undefined {
  const calc = getCalculator(c.calculator);
  if (!calc) return undefined;
  const mine = normalised(calc, c.inputs);
  if (!mine) return undefined;
  return calc.verification.find((v) => { const theirs = normalised(calc, v.inputs); return theirs !== undefined && sameInputs(mine, theirs); })?.name;
}

function normalised(calc: CalculatorDefinition, inputs: Values): Values | undefined {
  try { return evaluate(calc, inputs).values; } catch { return undefined; }
}

function sameInputs(a: Values, b: Values): boolean {
  const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
  return [...keys].every((k) => {
    const x = a[k], y = b[k];
    return typeof x === 'number' && typeof y === 'number' ? relativeDifference(x, y) <= 1e-12 : x === y;
  });
}

export function verifyPage(meta: Pick<PageMeta, 'calculators' | 'verification'>): PageVerification {
  const known = meta.calculators.flatMap((id) => { const c = getCalculator(id); return c ? [c] : []; });
  const problems = [
    ...meta.calculators.filter((id) => !getCalculator(id)).map((id) => `lists calculator '${id}', which does not exist`),
    ...meta.verification.flatMap((c) => {
      const twin = repeatedCase(c);
      return twin === undefined ? [] : [`frontmatter case '${c.name}' repeats the case '${twin}' of calculator ${c.calculator} (same inputs); keep it once, in the definition`];
    }),
  ];
  const rows = [...known.flatMap(definitionCases), ...meta.verification].flatMap(runCase);
  return { rows, failures: rows.filter((r) => !r.pass), problems };
}

function show(v: number | string | undefined): string {
  return v === undefined ? '—' : typeof v === 'number' ? String(Number(v.toPrecision(10))) : `'${v}'`;
}

/** "case 'X': zeta expected 0.2, computed 0.1 (difference 0.5 > tolerance 1e-12)". */
export function describeRow(r: CheckRow): string {
  if (r.error) return `case '${r.case}' (${r.calculator}): ${r.output === '—' ? '' : `${r.output} expected ${show(r.expected)}: `}${r.error}`;
  const diff = r.difference === undefined ? 'text differs' : `difference ${r.difference.toExponential(2)} > tolerance ${r.tolerance}`;
  return `case '${r.case}' (${r.calculator}): ${r.output} expected ${show(r.expected)}, computed ${show(r.computed)} (${diff})`;
}

/** A multi-line report of a page's failures, each line naming the page. */
export function failureReport(page: string, v: PageVerification): string {
  return [...v.problems.map((p) => `${page}: ${p}`), ...v.failures.map((r) => `${page}: verification ${describeRow(r)}`)].join('\n');
}

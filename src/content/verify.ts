/**
 * Executable verification of a page: runs each verification case of the page's frontmatter
 * against the core (through the calculator registry) and compares every expected output.
 * Used by the page layout (the build fails on a failing case), `dampbook check` and the tests.
 * Pure: no file system, no Astro.
 */
import { evaluate } from '../calculators/evaluate.ts';
import { getCalculator } from '../calculators/registry.ts';
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
export function difference(computed: number, expected: number): number {
  const d = Math.abs(computed - expected);
  return expected === 0 ? d : d / Math.abs(expected);
}

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

export function verifyPage(meta: Pick<PageMeta, 'calculators' | 'verification'>): PageVerification {
  const problems = meta.calculators.filter((id) => !getCalculator(id)).map((id) => `lists calculator '${id}', which does not exist`);
  const rows = meta.verification.flatMap(runCase);
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

/**
 * The tolerance envelope of a calculator: every numeric output's smallest and largest value while
 * up to 8 number inputs move inside their tolerances, with the inputs that drive each end. Pure
 * (no DOM, no I/O), generic over every definition: the page, the CLI and the tests call this.
 *
 * Method: all 2^k corners of the tolerance box, INTERIOR_SAMPLES Halton points inside it and the
 * nominal point; an extreme found off the corners (or one a small inward step from its corner
 * improves) is refined by a pattern search, so a peak inside the box (a resonance) is found, not
 * only the corners of a monotone closed form. A point whose evaluation fails is reported.
 */
import { DampbookError } from '../../core/errors.ts';
import { evaluate } from '../evaluate.ts';
import type { CalculatorDefinition, Outputs, Values } from '../types.ts';
import { corners, INTERIOR_SAMPLES, interiorPoints } from './points.ts';
import { patternSearch, refineBudget } from './refine.ts';
import { checkVariations, type CheckedVariation, type Variation } from './variations.ts';

/** Where a varied input sits at an extreme: at an end of its tolerance or between the ends. */
export type End = 'low' | 'high' | 'inside';

export interface OutputBounds {
  readonly min: number;
  readonly max: number;
  /** Varied input → where it sits at the minimum / maximum. */
  readonly minDrivers: Readonly<Record<string, End>>;
  readonly maxDrivers: Readonly<Record<string, End>>;
  /** The varied inputs' SI values at the minimum / maximum. */
  readonly minAt: Readonly<Record<string, number>>;
  readonly maxAt: Readonly<Record<string, number>>;
}

export interface PointFailure {
  readonly at: Readonly<Record<string, number>>;
  readonly message: string;
}

export interface EnvelopeResult {
  readonly varied: readonly CheckedVariation[];
  /** Numeric outputs that had a value at one point at least. */
  readonly bounds: Readonly<Record<string, OutputBounds>>;
  /** Points whose evaluation threw (the first MAX_REPORTED), and how many failed in all. */
  readonly failures: readonly PointFailure[];
  readonly failed: number;
  readonly corners: number;
  readonly interior: number;
  readonly refinement: number;
  /** One sentence naming the method and the counts, for the page and the CLI. */
  readonly method: string;
}

const MAX_REPORTED = 10;

interface Best { value: number; u: number[] }

export function methodText(k: number, interior: number, refinement: number): string {
  return `all 2^${k} = ${2 ** k} corners + ${interior} interior samples (Halton sequence) + the nominal point; extremes off the corners refined by a pattern search (${refinement} more evaluations)`;
}

/**
 * Which varied inputs reach each output: input j reaches it when two corners that differ only in
 * j give different values (beyond rounding), or when either of them failed (unknown: kept).
 */
function influence(atCorners: readonly (Outputs | undefined)[], numeric: readonly string[], k: number): Map<string, boolean[]> {
  const out = new Map<string, boolean[]>();
  for (const key of numeric) {
    out.set(key, Array.from({ length: k }, (_, j) => atCorners.some((a, i) => {
      if (i & (1 << j)) return false;
      const b = atCorners[i | (1 << j)];
      const x = a?.[key];
      const y = b?.[key];
      if (typeof x !== 'number' || typeof y !== 'number') return x !== y || !a || !b;
      return Math.abs(x - y) > 1e-12 * Math.max(Math.abs(x), Math.abs(y));
    })));
  }
  return out;
}

export function envelope(calc: CalculatorDefinition, nominal: Values, vary: Readonly<Record<string, Variation>>): EnvelopeResult {
  const base = evaluate(calc, nominal).values;
  const varied = checkVariations(calc, base, vary);
  const k = varied.length;
  const numeric = calc.outputs.filter((o) => o.kind !== 'text').map((o) => o.key);
  const lowest = new Map<string, Best>();
  const highest = new Map<string, Best>();
  const failures: PointFailure[] = [];
  let failed = 0;
  const at = (u: readonly number[]) => Object.fromEntries(varied.map((v, j) => [v.key, u[j] === 0 ? v.lo : u[j] === 1 ? v.hi : v.lo + u[j]! * (v.hi - v.lo)]));
  const cache = new Map<string, Outputs | undefined>();
  const run = (u: readonly number[]): Outputs | undefined => {
    const id = u.join(',');
    if (cache.has(id)) return cache.get(id);
    let out: Outputs | undefined;
    try {
      out = evaluate(calc, { ...base, ...at(u) }).outputs;
    } catch (e) {
      if (!(e instanceof DampbookError)) throw e;
      failed++;
      if (failures.length < MAX_REPORTED) failures.push({ at: at(u), message: e.message });
    }
    cache.set(id, out);
    if (out) {
      for (const key of numeric) {
        const y = out[key];
        if (typeof y !== 'number') continue;
        const lo = lowest.get(key);
        const hi = highest.get(key);
        if (!lo || y < lo.value) lowest.set(key, { value: y, u: [...u] });
        if (!hi || y > hi.value) highest.set(key, { value: y, u: [...u] });
      }
    }
    return out;
  };
  const cornerPts = corners(k);
  const atCorners = cornerPts.map((u) => run(u));
  const inner = interiorPoints(INTERIOR_SAMPLES, k);
  for (const u of inner) run(u);
  run(varied.map((v) => (base[v.key] as number) === v.lo ? 0 : (base[v.key] as number) === v.hi ? 1 : ((base[v.key] as number) - v.lo) / (v.hi - v.lo)));
  const sampled = cache.size;
  for (const key of numeric) {
    for (const [sense, table] of [[-1, lowest], [1, highest]] as const) {
      const b = table.get(key);
      // a constant output (the varied inputs do not reach it) has nothing to refine
      if (!b || lowest.get(key)!.value === highest.get(key)!.value) continue;
      const value = (u: readonly number[]) => { const y = run(u)?.[key]; return typeof y === 'number' ? y : undefined; };
      const atCorner = b.u.every((x) => x === 0 || x === 1);
      // from a corner, a small inward probe decides whether the extreme can lie inside at all
      patternSearch(value, b.u, b.value, sense, atCorner ? k : refineBudget(k), atCorner ? 1e-3 : undefined);
      const now = table.get(key)!;
      if (atCorner && now !== b) patternSearch(value, now.u, now.value, sense, refineBudget(k));
    }
  }
  const reach = influence(atCorners, numeric, k);
  // an input drives an end only if the output moves with it (its corners differ) or it sits inside
  const drivers = (key: string, u: readonly number[]) => Object.fromEntries(varied.flatMap((v, j) => {
    const end: End = u[j] === 0 ? 'low' : u[j] === 1 ? 'high' : 'inside';
    return end === 'inside' || reach.get(key)![j] ? [[v.key, end]] : [];
  })) as Record<string, End>;
  const bounds: Record<string, OutputBounds> = {};
  for (const key of numeric) {
    const lo = lowest.get(key);
    const hi = highest.get(key);
    if (!lo || !hi) continue;
    bounds[key] = { min: lo.value, max: hi.value, minDrivers: drivers(key, lo.u), maxDrivers: drivers(key, hi.u), minAt: at(lo.u), maxAt: at(hi.u) };
  }
  const refinement = cache.size - sampled;
  return { varied, bounds, failures, failed, corners: cornerPts.length, interior: inner.length, refinement, method: methodText(k, inner.length, refinement) };
}

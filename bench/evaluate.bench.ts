/**
 * Compute latency of one calculator: median, p99 and the worst case of `evaluate()` over random
 * valid inputs (the hostile suite's `validRecord` arbitrary, fixed seed), with and without chart
 * data. Used by `npm run bench` (bench/run.ts); run alone with
 * `npx tsx bench/evaluate.bench.ts [id …]` to print the table for some calculators.
 * Target (issue: responsive under heavy work): p99 ≤ 16 ms, one frame at 60 Hz.
 */
import fc from 'fast-check';
import { evaluate } from '../src/calculators/evaluate.ts';
import type { CalculatorDefinition } from '../src/calculators/types.ts';
import { DampbookError } from '../src/core/errors.ts';
import { validRecord } from '../test/calculators/hostile.arbitraries.ts';

export const FRAME_MS = 16;
const CLOSED_FORM_TARGET_MS = 0.2;
const SAMPLES = Number(process.env.DAMPBOOK_BENCH_SAMPLES ?? 2000);
/** Time budget per calculator and pass: slow (simulation-class) calculators get fewer samples. */
const BUDGET_MS = Number(process.env.DAMPBOOK_BENCH_BUDGET_MS ?? 8000);

export function quantile(sorted: readonly number[], q: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))] ?? NaN;
}

interface Timed<T> { readonly ms: number; readonly input: T }

/** Times fn over the inputs (after a warm-up pass) until done or out of budget; sorted by time. */
function time<T>(inputs: readonly T[], fn: (x: T) => unknown, budgetMs = BUDGET_MS): Timed<T>[] {
  const start = performance.now();
  for (const x of inputs.slice(0, 50)) { fn(x); if (performance.now() - start > budgetMs / 4) break; }
  const t: Timed<T>[] = [];
  const t1 = performance.now();
  for (const x of inputs) {
    const t0 = performance.now();
    fn(x);
    t.push({ ms: performance.now() - t0, input: x });
    if (t.length >= 20 && performance.now() - t1 > budgetMs) break;
  }
  return t.sort((a, b) => a.ms - b.ms);
}

const ms = (x: number) => Number(x.toPrecision(3));

/** Only the inputs that differ from the defaults, so the worst case is short enough to read. */
function changed(calc: CalculatorDefinition, input: Record<string, unknown>): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const d of calc.inputs) {
    const v = input[d.key];
    if (v === undefined || v === d.default) continue;
    out[d.key] = typeof v === 'string' && v.length > 80 ? `${v.slice(0, 60)}… (${v.length} chars)` : v;
  }
  return out;
}

export function evaluateLatency(calc: CalculatorDefinition) {
  const raw = fc.sample(validRecord(calc), { numRuns: SAMPLES * 2, seed: 42 });
  process.stderr.write(`latency ${calc.id}…\n`);
  const t0 = performance.now();
  const ok: Record<string, unknown>[] = [];
  let tried = 0;
  for (const r of raw) {
    tried++;
    if (ok.length >= SAMPLES || (ok.length >= 20 && performance.now() - t0 > BUDGET_MS)) break;
    try { evaluate(calc, r, { fillDefaults: false }); ok.push(r); } catch { /* typed error: no answer for this record */ }
  }
  const compute = time(ok, (r) => evaluate(calc, r, { fillDefaults: false }));
  // chart data may be refused with a typed error for extreme inputs (the page then keeps the results table)
  const withCharts = calc.charts ? time(ok, (r) => { const res = evaluate(calc, r, { fillDefaults: false }); try { return calc.charts!(res.values, res); } catch (e) { if (e instanceof DampbookError) return undefined; throw e; } }) : undefined;
  const times = compute.map((c) => c.ms);
  const median = quantile(times, 0.5);
  const p99 = quantile(times, 0.99);
  const worst = compute[compute.length - 1];
  const chartTimes = withCharts?.map((c) => c.ms);
  const chartWorst = withCharts?.[withCharts.length - 1];
  return {
    id: calc.id,
    samples: ok.length,
    rejected: tried > ok.length ? `${tried - ok.length} of ${tried} random records had no answer (typed error)` : undefined,
    medianMs: ms(median),
    p99Ms: ms(p99),
    worstMs: worst ? ms(worst.ms) : undefined,
    worstInput: worst ? changed(calc, worst.input) : undefined,
    withChartsMedianMs: chartTimes ? ms(quantile(chartTimes, 0.5)) : undefined,
    withChartsP99Ms: chartTimes ? ms(quantile(chartTimes, 0.99)) : undefined,
    withChartsWorstMs: chartWorst ? ms(chartWorst.ms) : undefined,
    withinFrame: p99 <= FRAME_MS,
    /** With chart data too, as the page computes it. */
    pageWithinFrame: Math.max(p99, chartTimes ? quantile(chartTimes, 0.99) : 0) <= FRAME_MS,
    /** Computed in the page's worker (CalculatorDefinition.offMainThread): typing does not wait for it. */
    offMainThread: calc.offMainThread === true,
    class: median <= CLOSED_FORM_TARGET_MS ? 'fast (≤ 0.2 ms median)' : 'simulation-class (> 0.2 ms median)',
    evaluationsPerSecond: Math.round(1000 / median),
  };
}

export type Latency = ReturnType<typeof evaluateLatency>;

export function latencyLine(l: Latency): string {
  const charts = l.withChartsMedianMs !== undefined ? `  (with charts ${l.withChartsMedianMs} / ${l.withChartsP99Ms} / worst ${l.withChartsWorstMs} ms)` : '';
  const verdict = l.pageWithinFrame ? 'within a frame' : l.offMainThread ? 'over a frame, computed off the main thread' : 'OVER A FRAME ON THE MAIN THREAD: mark it offMainThread';
  return `${l.id.padEnd(22)} median ${l.medianMs} ms  p99 ${l.p99Ms} ms  worst ${l.worstMs} ms${charts}  ${verdict}`;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const { calculators } = await import('../src/calculators/registry.ts');
  const want = process.argv.slice(2);
  for (const c of calculators.filter((c) => want.length === 0 || want.includes(c.id))) {
    const l = evaluateLatency(c);
    console.log(latencyLine(l));
    if (!l.pageWithinFrame) console.log(`  worst input: ${JSON.stringify(l.worstInput)}`);
  }
}

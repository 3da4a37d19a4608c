/**
 * `npm run bench`: compute latency of every registered calculator (median and p99 of evaluate()
 * over many random valid inputs, with and without chart data), simulation and CSV throughput,
 * and bytes per page (gzip) of HTML, CSS and JS on a calculator page and a prose page, measured
 * in Chromium on the built site (dist/, built first if missing), and a 10,000-row recorded-motion
 * CSV processed by the built page in Chromium, and `dampbook batch` rows/s (bench/batch.bench.ts). Writes bench/results/latest.json
 * and prints a summary. Never part of `npm test`.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { cpus, totalmem } from 'node:os';
import { join, resolve } from 'node:path';
import { gzipSync } from 'node:zlib';
import { evaluate } from '../src/calculators/evaluate.ts';
import { calculators } from '../src/calculators/registry.ts';
import type { CalculatorDefinition } from '../src/calculators/types.ts';
import { serveStatic } from '../src/server/staticServer.ts';
import { launch } from '../test/helpers/browser.ts';
import { calculatorPages, prosePages } from '../test/helpers/calcPages.ts';
import { fileFor } from '../test/helpers/crawl.ts';
import { batchBench } from './batch.bench.ts';
import { evaluateLatency, latencyLine, quantile } from './evaluate.bench.ts';
import { generateCsv } from './lib/csv.ts';
import { motionRecord } from './lib/motionRecord.ts';

const SAMPLES = Number(process.env.DAMPBOOK_BENCH_SAMPLES ?? 2000);
const CLOSED_FORM_TARGET_MS = 0.2;

/** Times fn over the inputs (after a warm-up pass); per-call ms, sorted. */
function time<T>(inputs: readonly T[], fn: (x: T) => unknown): number[] {
  for (const x of inputs.slice(0, 5)) fn(x);
  return inputs.map((x) => { const t0 = performance.now(); fn(x); return performance.now() - t0; }).sort((a, b) => a - b);
}

/** CSV throughput for calculators with a text input: a generated 10,000-row record, when one can be made. */
function csvThroughput(calc: CalculatorDefinition) {
  return calc.inputs.filter((d) => d.kind === 'text').map((def) => {
    if (def.kind !== 'text') return undefined;
    const csv = generateCsv(def.default, 10_000);
    if (!csv) return { id: calc.id, input: def.key, skipped: 'default text is not a numeric CSV to extend; no generic 10,000-row record' };
    if (csv.length > def.maxLength) return { id: calc.id, input: def.key, skipped: `10,000 rows (${csv.length} chars) exceed maxLength ${def.maxLength}` };
    const raw = Object.fromEntries(calc.inputs.map((d) => [d.key, d.default])) as Record<string, unknown>;
    raw[def.key] = csv;
    try { evaluate(calc, raw); } catch (e) { return { id: calc.id, input: def.key, skipped: `generated record refused: ${(e as Error).message.slice(0, 120)}` }; }
    const t = time(Array.from({ length: 20 }, () => raw), (r) => evaluate(calc, r));
    const median = quantile(t, 0.5);
    return { id: calc.id, input: def.key, rows: 10_000, medianMs: Number(median.toPrecision(3)), rowsPerSecond: Math.round(10_000 / (median / 1000)) };
  }).filter(Boolean);
}

const CSV_ROWS = 10_000;
const CSV_TARGET_MS = 200;

/**
 * The 10,000-row record processed in Chromium on the built recorded-motion page: the record is
 * put in the page's CSV field and the page's own recompute (read and check every field, parse
 * the CSV, compute, show results, redraw the charts) is timed with performance.now() in the page.
 * The first run loads the chart module and is reported apart; the median is over the next runs.
 */
async function csvInBrowser(browser: Awaited<ReturnType<typeof launch>>, origin: string, path: string | undefined) {
  if (!path) return { skipped: 'no built page shows the recorded-motion calculator' };
  const csv = motionRecord(CSV_ROWS);
  const page = await browser.newPage();
  try {
    await page.goto(`${origin}${path}`, { waitUntil: 'networkidle' });
    await page.waitForFunction(() => document.querySelector('db-calculator[data-calc="recorded-motion"]')?.hasAttribute('data-ready'));
    const runs = await page.evaluate(async ({ text, n }) => {
      type Live = HTMLElement & { recompute(): void; outputs?: Record<string, unknown> };
      const el = document.querySelector<Live>('db-calculator[data-calc="recorded-motion"]')!;
      const area = el.querySelector<HTMLTextAreaElement>('textarea[name="csv"]')!;
      const times: number[] = [];
      const used: unknown[] = [];
      for (let i = 0; i < n; i++) {
        area.value = `${text}\n# run ${i}`; // a change every run
        const t0 = performance.now();
        el.recompute();
        times.push(performance.now() - t0);
        used.push(el.outputs?.rowsUsed);
        await new Promise((r) => setTimeout(r, i === 0 ? 500 : 20)); // first run: chart module loads
      }
      return { times, used };
    }, { text: csv, n: 12 });
    if (runs.used.some((u) => u !== CSV_ROWS)) throw new Error(`csvInBrowser: the page did not use all ${CSV_ROWS} rows: ${JSON.stringify(runs.used)}`);
    const warm = runs.times.slice(1).sort((a, b) => a - b);
    const median = quantile(warm, 0.5);
    return {
      page: path, rows: CSV_ROWS, csvBytes: csv.length, runs: warm.length,
      firstRunMs: Number(runs.times[0]!.toPrecision(3)), medianMs: Number(median.toPrecision(3)), maxMs: Number(warm[warm.length - 1]!.toPrecision(3)),
      target: `< ${CSV_TARGET_MS} ms`, met: median < CSV_TARGET_MS,
    };
  } finally {
    await page.close();
  }
}

async function bytesPerPage() {
  const dist = resolve('dist');
  // a fresh build, so the figures are of this source (DAMPBOOK_BENCH_REUSE=1 keeps an existing dist/)
  if (process.env.DAMPBOOK_BENCH_REUSE !== '1' || !existsSync(join(dist, 'index.html'))) execFileSync('npm', ['run', 'build'], { stdio: 'inherit' });
  const calcPages = calculatorPages(dist, '/').map((p) => p.path);
  const prosePage = prosePages(dist, '/').find((p) => p !== '/404.html');
  const server = await serveStatic(dist, '/');
  const browser = await launch();
  const gz = (path: string) => gzipSync(readFileSync(fileFor(dist, '/', path)!)).length;
  const measure = async (path: string | undefined, live: boolean) => {
    if (!path) return undefined;
    const page = await browser.newPage();
    const seen = new Map<string, string>();
    page.on('response', (r) => { const u = new URL(r.url()); if (u.origin === server.origin) seen.set(u.pathname, r.request().resourceType()); });
    await page.goto(`${server.origin}${path}`, { waitUntil: 'networkidle' });
    if (live) {
      await page.waitForFunction(() => [...document.querySelectorAll('db-calculator')].every((c) => c.hasAttribute('data-ready')));
      await page.waitForFunction(() => [...document.querySelectorAll('db-calculator .chart-canvas')].every((c) => c.hasAttribute('data-live')));
    }
    await page.close();
    let html = 0; let css = 0; let js = 0;
    const scripts: string[] = [];
    for (const [p, type] of seen) {
      if (p.startsWith('/pagefind/')) continue; // search engine: loads on first use of the search box
      if (type === 'document') html += gz(p);
      else if (p.endsWith('.css')) css += gz(p);
      else if (p.endsWith('.js') || p.endsWith('.mjs')) { js += gz(p); scripts.push(`${p} ${gz(p)}`); }
    }
    return { path, htmlGzBytes: html, cssGzBytes: css, jsGzBytes: js, scripts };
  };
  try {
    // every calculator page, live with its charts drawn: the budget is for the heaviest
    const all = [];
    for (const p of calcPages) all.push((await measure(p, true))!);
    all.sort((a, b) => b.jsGzBytes - a.jsGzBytes);
    const js = all.map((m) => m.jsGzBytes).sort((a, b) => a - b);
    return {
      calculatorPages: { pages: all.length, jsGzMedian: quantile(js, 0.5), jsGzMax: js[js.length - 1], perPage: all.map((m) => `${m.path} ${m.jsGzBytes}`) },
      calculatorPage: all[0],
      prosePage: await measure(prosePage ?? '/', false),
      csvInBrowser: await csvInBrowser(browser, server.origin, calculatorPages(dist, '/').find((p) => p.calcs.includes('recorded-motion'))?.path),
    };
  } finally {
    await browser.close();
    await server.close();
  }
}

const lat = calculators.map(evaluateLatency);
const csv = calculators.flatMap(csvThroughput);
const batch = await batchBench();
const bytes = await bytesPerPage();
const result = {
  date: new Date().toISOString(),
  machine: `${cpus().length} × ${cpus()[0]?.model.trim() ?? 'cpu'}, ${(totalmem() / 2 ** 30).toFixed(0)} GiB, Node ${process.version}`,
  samplesPerCalculator: SAMPLES,
  latency: lat,
  simulationThroughput: lat.filter((l) => l.medianMs > CLOSED_FORM_TARGET_MS).map((l) => ({ id: l.id, evaluationsPerSecond: l.evaluationsPerSecond })),
  csvThroughput: csv.length ? csv : 'no calculator with a text (CSV) input is registered',
  batch,
  bytes,
};
mkdirSync('bench/results', { recursive: true });
writeFileSync('bench/results/latest.json', `${JSON.stringify(result, null, 2)}\n`);
console.log(`machine: ${result.machine}`);
for (const l of lat) console.log(latencyLine(l));
console.log('csv:', JSON.stringify(result.csvThroughput));
console.log('batch:', JSON.stringify(batch));
const { csvInBrowser: inBrowser, ...pageBytes } = bytes;
console.log('csv in Chromium:', JSON.stringify(inBrowser));
console.log('bytes:', JSON.stringify(pageBytes));
console.log('written bench/results/latest.json');

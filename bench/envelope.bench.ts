/**
 * Tolerance envelope of a closed-form calculator with 6 varied inputs (impact: m, v, Fp, s, cph,
 * vEndRatio, each ±10 %): 64 corners + 64 interior samples + the nominal point + the refinement.
 * Node figure: envelope() alone. Browser figure: the built impact page in Chromium, from switching
 * tolerances on to the ranges written into the results table (envelope + render), timed in the
 * page. Target ≤ 20 ms in the browser (issue: bounds and long-duration duty). Needs a built site
 * (dist/ or DAMPBOOK_SITE) for the browser part. Run: npx tsx bench/envelope.bench.ts
 */
import { existsSync } from 'node:fs';
import { envelope } from '../src/calculators/envelope/index.ts';
import { defaults } from '../src/calculators/evaluate.ts';
import { impactCalculator } from '../src/calculators/duty/impact.ts';
import { serveStatic } from '../src/server/staticServer.ts';
import { launch } from '../test/helpers/browser.ts';
import { median, medianMs } from './lib/timing.ts';

const KEYS = ['m', 'v', 'Fp', 's', 'cph', 'vEndRatio'] as const;
const TARGET_MS = 20;

const d = defaults(impactCalculator);
const vary = Object.fromEntries(KEYS.map((k) => [k, { lo: (d[k] as number) * 0.9, hi: (d[k] as number) * 1.1 }]));
const e = envelope(impactCalculator, d, vary);
const node = medianMs(() => envelope(impactCalculator, d, vary), 21, 5);
console.log(`impact envelope, 6 inputs ±10 % (${e.method}), node: median ${node.toFixed(1)} ms`);

const SITE = process.env.DAMPBOOK_SITE ?? (existsSync('dist/index.html') ? 'dist' : '.test-out/root');
const served = await serveStatic(SITE, '/');
const browser = await launch();
try {
  const page = await browser.newPage();
  await page.goto(`${served.url}duty/impact/`, { waitUntil: 'networkidle' });
  await page.waitForSelector('db-calculator[data-calc="impact"][data-tools]');
  const r = await page.evaluate(async ({ keys, n }) => {
    const el = document.querySelector<HTMLElement>('db-calculator[data-calc="impact"]')!;
    for (const k of keys) el.querySelector<HTMLInputElement>(`input[name="${k}.tol"]`)!.value = '±10%';
    const on = el.querySelector<HTMLInputElement>('input.vary-on')!;
    const times: number[] = [];
    for (let i = 0; i < n; i++) {
      on.checked = false;
      on.dispatchEvent(new Event('change', { bubbles: true }));
      on.checked = true;
      const t0 = performance.now();
      on.dispatchEvent(new Event('change', { bubbles: true })); // computes and renders at once
      times.push(performance.now() - t0);
      await new Promise((res) => setTimeout(res, 20));
    }
    return { times, ok: el.hasAttribute('data-envelope'), cells: el.querySelectorAll('td.env[data-min]').length };
  }, { keys: [...KEYS], n: 15 });
  if (!r.ok || r.cells === 0) throw new Error('the page computed no envelope');
  const warm = r.times.slice(1).sort((a, b) => a - b);
  const mid = median(warm);
  console.log(`impact envelope, 6 inputs, in Chromium (envelope + results table): median ${mid.toFixed(1)} ms, worst ${warm.at(-1)!.toFixed(1)} ms, first ${r.times[0]!.toFixed(1)} ms; target ≤ ${TARGET_MS} ms: ${mid <= TARGET_MS ? 'met' : 'NOT MET'}`);
} finally {
  await browser.close();
  await served.close();
}

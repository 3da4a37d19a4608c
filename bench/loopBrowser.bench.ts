/**
 * A 10,000-row measured force–displacement record on the built recorded-motion page in Chromium:
 * the page's own recompute (read every field, parse the record, loop metrics per cycle, results,
 * work-loop and force–velocity charts) timed in the page. Target ≤ 200 ms (issue: damper from
 * test data). Needs a built site (dist/ or DAMPBOOK_SITE). Run: npx tsx bench/loopBrowser.bench.ts
 */
import { existsSync } from 'node:fs';
import { serveStatic } from '../src/server/staticServer.ts';
import { launch } from '../test/helpers/browser.ts';
import { motionRecord } from './lib/motionRecord.ts';
import { median } from './lib/timing.ts';

const SITE = process.env.DAMPBOOK_SITE ?? (existsSync('dist/index.html') ? 'dist' : '.test-out/root');
const ROWS = 10_000;
const served = await serveStatic(SITE, '/');
const browser = await launch();
try {
  const page = await browser.newPage();
  await page.goto(`${served.url}duty/recorded-motion/`, { waitUntil: 'networkidle' });
  await page.waitForSelector('db-calculator[data-calc="recorded-motion"][data-ready]');
  const r = await page.evaluate(async ({ text, n }) => {
    type Live = HTMLElement & { recompute(): void; outputs?: Record<string, unknown> };
    const el = document.querySelector<Live>('db-calculator[data-calc="recorded-motion"]')!;
    const area = el.querySelector<HTMLTextAreaElement>('textarea[name="csv"]')!;
    const times: number[] = [];
    let keff: unknown;
    for (let i = 0; i < n; i++) {
      area.value = `${text}\n# run ${i}`;
      const t0 = performance.now();
      el.recompute();
      times.push(performance.now() - t0);
      keff = el.outputs?.keff;
      await new Promise((res) => setTimeout(res, i === 0 ? 500 : 20));
    }
    return { times, keff };
  }, { text: motionRecord(ROWS), n: 12 });
  if (typeof r.keff !== 'number') throw new Error('the page computed no loop metrics (k_eff) for the record');
  const warm = r.times.slice(1).sort((a, b) => a - b);
  const mid = median(warm);
  console.log(`recorded-motion with loop metrics, ${ROWS} rows, in Chromium: median ${mid.toFixed(1)} ms, worst ${warm.at(-1)!.toFixed(1)} ms, first ${r.times[0]!.toFixed(1)} ms; target ≤ 200 ms: ${mid <= 200 ? 'met' : 'NOT MET'}`);
} finally {
  await browser.close();
  await served.close();
}

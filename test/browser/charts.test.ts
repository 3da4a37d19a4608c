/**
 * Charts people can read, in real Chromium against the built site (behaviour, no reference values):
 * on road-power the power-against-speed chart marks the operating point (the speed input) in the
 * static SVG and in the live chart's description, and no two tick labels of any chart on the page
 * overlap as rendered, at 1280 px and at 390 px. Label boxes are the rendered SVG text boxes
 * (getBoundingClientRect), read with scripts off so the server-drawn charts are the ones shown;
 * the live charts are read from their chart.js scales.
 */
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { watchedPage } from '../helpers/browser.ts';
import { serveBuiltSite } from '../helpers/servedSite.ts';

const site = serveBuiltSite();
const PAGE = 'duty/road-power/';

/** The live chart.js scales: the element keeps its ChartGroup (`charts`), which keeps one chart.js
 * instance per figure; label boxes come from the scale's own measured label sizes. */
async function expectLiveLabelsApart(page: Page): Promise<void> {
  const live = await page.evaluate(() => {
    type Scale = { ticks: { value: number; label?: unknown }[]; getPixelForTick(i: number): number; isHorizontal(): boolean; _getLabelSizes(): { widths: number[]; heights: number[] } };
    const el = document.querySelector('db-calculator') as unknown as { charts: { charts: Map<string, { scales: Record<string, Scale> }> } };
    const out: { chart: string; axis: string; labels: string[]; overlaps: string[] }[] = [];
    for (const [id, chart] of el.charts.charts) for (const axis of ['x', 'y']) {
      const sc = chart.scales[axis]!;
      const sizes = sc._getLabelSizes();
      const horizontal = sc.isHorizontal();
      const boxes = sc.ticks.map((t, i) => { const c = sc.getPixelForTick(i); const half = (horizontal ? sizes.widths[i]! : sizes.heights[i]!) / 2; return { label: String(t.label), lo: c - half, hi: c + half }; });
      boxes.sort((a, b) => a.lo - b.lo);
      const overlaps: string[] = [];
      for (let i = 1; i < boxes.length; i++) if (boxes[i]!.lo < boxes[i - 1]!.hi) overlaps.push(`${boxes[i - 1]!.label}|${boxes[i]!.label}`);
      out.push({ chart: id, axis, labels: boxes.map((b) => b.label), overlaps });
    }
    return out;
  });
  expect(live.length).toBeGreaterThanOrEqual(6);
  for (const a of live) {
    expect(a.overlaps, `${a.chart} ${a.axis}: ${a.labels.join(' ')}`).toEqual([]);
    expect(a.labels.length, `${a.chart} ${a.axis}`).toBeGreaterThanOrEqual(2);
  }
}

type Box = { axis: string; chart: string; text: string; left: number; right: number; top: number; bottom: number };

describe('charts on road-power', () => {
  for (const width of [1280, 390]) {
    it(`static charts: operating point marked, tick labels never overlap (${width} px)`, async () => {
      const ctx = await site.browser.newContext({ javaScriptEnabled: false, viewport: { width, height: 900 } });
      const page = await ctx.newPage();
      await page.goto(`${site.server.url}${PAGE}`);
      const marker = page.locator('figure[data-chart="power-speed"] svg line.svg-marker.operating');
      expect(await marker.count()).toBe(1);
      expect(await page.locator('figure[data-chart="power-speed"] svg text.svg-operating').textContent()).toBe('this case 20 m/s');
      const boxes: Box[] = await page.$$eval('figure[data-chart] svg text.svg-tick[data-axis]', (els) => els.map((e) => {
        const r = e.getBoundingClientRect();
        return { axis: e.getAttribute('data-axis')!, chart: e.closest('figure')!.getAttribute('data-chart')!, text: e.textContent ?? '', left: r.left, right: r.right, top: r.top, bottom: r.bottom };
      }));
      const charts = new Set(boxes.map((b) => b.chart));
      expect(charts.size).toBeGreaterThanOrEqual(3);
      for (const chart of charts) for (const axis of ['x', 'y']) {
        const on = boxes.filter((b) => b.chart === chart && b.axis === axis);
        expect(on.length, `${chart} ${axis}: at least two labels`).toBeGreaterThanOrEqual(2);
        for (let i = 0; i < on.length; i++) for (let j = i + 1; j < on.length; j++) {
          const a = on[i]!; const b = on[j]!;
          const overlap = a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom;
          expect(overlap, `${chart} ${axis}: "${a.text}" and "${b.text}" overlap`).toBe(false);
        }
      }
      // the log speed axis: decades and 1-2-5 values only, written in one format
      const speed = boxes.filter((b) => b.chart === 'power-speed' && b.axis === 'x').map((b) => b.text);
      for (const t of speed) expect(t).toMatch(/^(1|2|5)(0*)(\.\d+)?$|^0\.0*[125]$/);
      await ctx.close();
    });
  }

  it('the live chart says where the operating point is and follows the speed input', async () => {
    const w = await watchedPage(site.browser, site.server.origin);
    const { page } = w;
    await page.goto(`${site.server.url}${PAGE}`);
    await page.waitForSelector('db-calculator[data-ready]');
    const canvas = page.locator('figure[data-chart="power-speed"] canvas');
    await canvas.waitFor();
    await expect.poll(() => canvas.getAttribute('aria-label')).toContain('this case, vehicle speed 20 m/s');
    await expectLiveLabelsApart(page);
    await page.fill('#c-road-power-V', '30');
    await expect.poll(() => canvas.getAttribute('aria-label'), { timeout: 20000 }).toContain('this case, vehicle speed 30 m/s');
    expect(w.pageErrors).toEqual([]);
    expect(w.consoleErrors).toEqual([]);
  });

  it('at 390 px the tolerance mode keeps one column and the page does not scroll sideways', async () => {
    const w = await watchedPage(site.browser, site.server.origin, { width: 390, height: 900 });
    await w.page.goto(`${site.server.url}${PAGE}`);
    await w.page.waitForSelector('db-calculator[data-ready]');
    await w.page.locator('.vary-toggle input').first().check();
    await expect.poll(() => w.page.locator('db-calculator').first().getAttribute('data-vary')).not.toBeNull();
    expect(await w.page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    // units stay whole: no unit cell wraps onto a second line
    const split = await w.page.$$eval('.out-table td.unit', (tds) => tds.filter((td) => {
      if (!td.firstChild || !td.textContent) return false;
      const r = document.createRange();
      r.selectNodeContents(td);
      return r.getClientRects().length > 1 || td.scrollWidth > td.clientWidth; // wrapped onto two lines, or clipped
    }).map((td) => td.textContent));
    expect(split).toEqual([]);
  });

  it('live chart labels stay apart at 390 px too', async () => {
    const w = await watchedPage(site.browser, site.server.origin, { width: 390, height: 900 });
    await w.page.goto(`${site.server.url}${PAGE}`);
    await w.page.waitForSelector('db-calculator[data-ready]');
    await w.page.locator('figure[data-chart="power-speed"] canvas').waitFor();
    await expectLiveLabelsApart(w.page);
  });
});

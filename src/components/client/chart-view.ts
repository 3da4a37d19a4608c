/**
 * Live charts: draws ChartSpec data with chart.js into the figures the server rendered, in the
 * reader's unit system. Loaded only when a calculator with charts recomputes, so prose pages and
 * the first paint never pay for the charting library. Only the chart.js parts we use are
 * registered (tree shaking keeps the page budget): the legend is a small HTML list under the
 * canvas instead of chart.js's Legend and Tooltip plugins (about 8 KB gzip less).
 */
import {
  Chart, LinearScale, LineController, LineElement, LogarithmicScale, PointElement,
  type ChartConfiguration, type ChartDataset,
} from 'chart.js';
import type { ChartSpec } from '../../calculators/types.ts';
import type { UnitSystem } from '../../core/units/index.ts';
import { displayUnit, formatNumber, quantityText, toDisplay } from '../render/format.ts';

Chart.register(LineController, LineElement, PointElement, LinearScale, LogarithmicScale);

type Pt = { x: number; y: number };

function tone(n: number): string {
  return getComputedStyle(document.documentElement).getPropertyValue(`--tone-${n % 6}`).trim() || '#333';
}

function config(spec: ChartSpec, system: UnitSystem): ChartConfiguration<'line', Pt[]> {
  const ux = displayUnit(spec.x.kind, system);
  const uy = displayUnit(spec.y.kind, system);
  const xlog = spec.x.scale === 'log';
  const ylog = spec.y.scale === 'log';
  const datasets: ChartDataset<'line', Pt[]>[] = spec.series.map((s) => {
    const data: Pt[] = [];
    for (let i = 0; i < s.x.length; i++) {
      const x = toDisplay(s.x[i]!, ux);
      const y = toDisplay(s.y[i]!, uy);
      if (Number.isFinite(x) && Number.isFinite(y) && (!xlog || x > 0) && (!ylog || y > 0)) data.push({ x, y });
    }
    const c = tone(s.tone ?? 0);
    const points = s.style === 'points';
    return {
      label: s.label, data, borderColor: c, backgroundColor: c,
      borderWidth: s.style === 'thin' ? 1 : 2, borderDash: s.style === 'dash' ? [6, 4] : [],
      pointRadius: points ? 5 : 0, pointStyle: 'circle', showLine: !points, tension: 0,
    };
  });
  let yLo = Infinity;
  let yHi = -Infinity;
  for (const d of datasets) for (const p of d.data) { yLo = Math.min(yLo, p.y); yHi = Math.max(yHi, p.y); }
  for (const m of spec.markers ?? []) {
    const x = toDisplay(m.x, ux);
    if (Number.isFinite(yLo)) datasets.push({ label: m.label, data: [{ x, y: yLo }, { x, y: yHi }], borderColor: '#8e877a', borderWidth: 1, borderDash: [2, 3], pointRadius: 0 });
  }
  const sortedX = datasets.every((d) => d.data.every((p, i) => i === 0 || p.x >= d.data[i - 1]!.x));
  const axisTitle = (label: string, sym: string) => ({ display: true, text: sym ? `${label} [${sym}]` : label });
  return {
    type: 'line',
    data: { datasets },
    options: {
      animation: false,
      responsive: true,
      maintainAspectRatio: false,
      // unparsed data is taken as sorted in x; loops (force against stroke) are not, so let
      // chart.js parse those and find out for itself
      parsing: sortedX ? false : undefined,
      normalized: sortedX,
      events: [],
      scales: {
        x: { type: xlog ? 'logarithmic' : 'linear', title: axisTitle(spec.x.label, ux.symbol), min: spec.x.min !== undefined ? toDisplay(spec.x.min, ux) : undefined, max: spec.x.max !== undefined ? toDisplay(spec.x.max, ux) : undefined,
          ticks: { callback: (v) => formatNumber(Number(v), 3) } },
        y: { type: ylog ? 'logarithmic' : 'linear', title: axisTitle(spec.y.label, uy.symbol), min: spec.y.min !== undefined ? toDisplay(spec.y.min, uy) : undefined, max: spec.y.max !== undefined ? toDisplay(spec.y.max, uy) : undefined,
          ticks: { callback: (v) => formatNumber(Number(v), 3) } },
      },
    },
  };
}

/** The legend as an HTML list (text, so it also reads and zooms well); series with `legend: false` are left out. */
function legend(fig: HTMLElement, spec: ChartSpec): void {
  let ul = fig.querySelector<HTMLUListElement>('.chart-legend');
  if (!ul) {
    ul = document.createElement('ul');
    ul.className = 'chart-legend';
    fig.querySelector('.chart-canvas')!.after(ul);
  }
  ul.replaceChildren(...spec.series.filter((s) => s.legend !== false).map((s) => {
    const li = document.createElement('li');
    const key = document.createElement('span');
    key.className = `chart-key ${s.style ?? 'line'}`;
    key.style.setProperty('--key', tone(s.tone ?? 0));
    key.setAttribute('aria-hidden', 'true');
    li.append(key, s.label);
    return li;
  }));
}

/** The charts of one calculator: one chart.js instance per server-rendered figure. */
export class ChartGroup {
  private readonly charts = new Map<string, Chart<'line', Pt[]>>();
  constructor(private readonly host: HTMLElement) {}

  update(specs: readonly ChartSpec[], system: UnitSystem): void {
    for (const spec of specs) {
      const fig = this.host.querySelector<HTMLElement>(`figure[data-chart="${CSS.escape(spec.id)}"]`);
      if (!fig) continue;
      const box = fig.querySelector<HTMLElement>('.chart-canvas')!;
      const text = quantityText(spec.summary, system);
      const summary = fig.querySelector('.chart-summary');
      if (summary) summary.textContent = text;
      let chart = this.charts.get(spec.id);
      const cfg = config(spec, system);
      legend(fig, spec);
      if (!chart) {
        const canvas = document.createElement('canvas');
        canvas.setAttribute('role', 'img');
        canvas.setAttribute('aria-label', `${spec.title}. ${text}`);
        box.append(canvas);
        box.dataset.live = '';
        chart = new Chart(canvas, cfg);
        this.charts.set(spec.id, chart);
      } else {
        chart.data = cfg.data;
        chart.options = cfg.options!;
        chart.canvas.setAttribute('aria-label', `${spec.title}. ${text}`);
        chart.update();
      }
    }
  }
}

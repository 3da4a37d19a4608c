/**
 * Live charts: draws ChartSpec data with chart.js into the figures the server rendered, in the
 * reader's unit system. Loaded only when a calculator with charts recomputes, so prose pages and
 * the first paint never pay for the charting library. Only the chart.js parts we use are
 * registered (tree shaking keeps the page budget): the legend is a small HTML list under the
 * canvas instead of chart.js's Legend and Tooltip plugins (about 8 KB gzip less).
 */
import {
  Chart, LinearScale, LineController, LineElement, LogarithmicScale, PointElement,
  type ChartConfiguration, type ChartDataset, type Plugin, type Scale,
} from 'chart.js';
import type { ChartMarker, ChartSpec } from '../../calculators/types.ts';
import type { UnitSystem } from '../../core/units/index.ts';
import { displayUnit, formatNumber, quantityText, toDisplay } from '../render/format.ts';
import { chooseTicks, niceRange, type TickOptions } from '../render/ticks.ts';
import { seriesDash, seriesStyle } from '../render/palette.ts';

Chart.register(LineController, LineElement, PointElement, LinearScale, LogarithmicScale);

type Pt = { x: number; y: number };

/** chart.js tick labels are 12 px: a digit is about 6.7 px wide; 7.5 leaves a margin for the estimate. */
const CHAR_PX = 7.5;
const LINE_PX = 15;

/**
 * Scale options that hand tick choice and labels to render/ticks.ts (the same rules as the
 * static SVG): the range is widened to whole steps on a linear axis, the ticks are replaced after
 * chart.js builds its own, and no label is skipped or rotated (none collide by construction).
 */
function axisOptions(log: boolean, fixed: { lo: boolean; hi: boolean }) {
  const labels = new Map<number, string>();
  const opts = (scale: Scale): TickOptions => {
    const horizontal = scale.isHorizontal();
    return { log, lengthPx: horizontal ? scale.width : scale.height, charPx: CHAR_PX, along: horizontal ? 'width' : 'height', lineHeightPx: LINE_PX };
  };
  return {
    bounds: 'data' as const,
    afterDataLimits: (scale: Scale) => {
      if (log) return;
      const r = niceRange(scale.min, scale.max, opts(scale), fixed);
      scale.min = r.lo;
      scale.max = r.hi;
    },
    afterBuildTicks: (scale: Scale) => {
      const ticks = chooseTicks(scale.min, scale.max, opts(scale));
      labels.clear();
      for (const t of ticks) labels.set(t.value, t.label);
      scale.ticks = ticks.map((t) => ({ value: t.value }));
    },
    ticks: { autoSkip: false, maxRotation: 0, minRotation: 0, callback: (v: number | string) => labels.get(Number(v)) ?? '' },
  };
}

/** Vertical marker lines across the plot area; the operating point is solid and labelled with its value. */
function markerPlugin(markers: readonly ChartMarker[], unitSymbol: string, toX: (si: number) => number): Plugin<'line'> {
  return {
    id: 'dbMarkers',
    afterDatasetsDraw(chart) {
      const { ctx, chartArea: area } = chart;
      const xs = chart.scales.x!;
      for (const m of markers) {
        const v = toX(m.x);
        const px = xs.getPixelForValue(v);
        if (!Number.isFinite(px) || px < area.left || px > area.right) continue;
        ctx.save();
        ctx.strokeStyle = m.operating ? '#203440' : '#8e877a';
        ctx.lineWidth = m.operating ? 1.5 : 1;
        ctx.setLineDash(m.operating ? [] : [2, 3]);
        ctx.beginPath();
        ctx.moveTo(px, area.top);
        ctx.lineTo(px, area.bottom);
        ctx.stroke();
        if (m.operating) {
          const left = px > (area.left + area.right) / 2;
          ctx.fillStyle = '#203440';
          ctx.font = '600 12px system-ui, sans-serif';
          ctx.textAlign = left ? 'right' : 'left';
          ctx.textBaseline = 'top';
          const text = `this case ${formatNumber(v, 3)}${unitSymbol ? ` ${unitSymbol}` : ''}`;
          const tx = px + (left ? -4 : 4);
          // a white halo keeps the label legible over the series
          ctx.lineWidth = 4;
          ctx.strokeStyle = '#fff';
          ctx.lineJoin = 'round';
          ctx.strokeText(text, tx, area.top + 3);
          ctx.fillText(text, tx, area.top + 3);
        }
        ctx.restore();
      }
    },
  };
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
    const c = seriesStyle(s.tone).colour;
    const points = s.style === 'points';
    return {
      label: s.label, data, borderColor: c, backgroundColor: c,
      borderWidth: s.style === 'thin' ? 1 : 2, borderDash: [...seriesDash(s.tone, s.style)],
      pointRadius: points ? 5 : 0, pointStyle: 'circle', showLine: !points, tension: 0,
    };
  });
  const sortedX = datasets.every((d) => d.data.every((p, i) => i === 0 || p.x >= d.data[i - 1]!.x));
  const axisTitle = (label: string, sym: string) => ({ display: true, text: sym ? `${label} [${sym}]` : label });
  return {
    type: 'line',
    data: { datasets },
    plugins: [markerPlugin(spec.markers ?? [], ux.symbol, (si) => toDisplay(si, ux))],
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
          ...axisOptions(xlog, { lo: spec.x.min !== undefined, hi: spec.x.max !== undefined }) },
        y: { type: ylog ? 'logarithmic' : 'linear', title: axisTitle(spec.y.label, uy.symbol), min: spec.y.min !== undefined ? toDisplay(spec.y.min, uy) : undefined, max: spec.y.max !== undefined ? toDisplay(spec.y.max, uy) : undefined,
          ...axisOptions(ylog, { lo: spec.y.min !== undefined, hi: spec.y.max !== undefined }) },
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
    key.style.setProperty('--key', seriesStyle(s.tone).colour);
    // the dash pattern as an image, so the key matches the line in greyscale print too
    const dash = seriesDash(s.tone, s.style);
    if (s.style !== 'points' && dash.length) key.style.setProperty('border-image', `repeating-linear-gradient(90deg, var(--key) 0 ${dash[0]}px, transparent ${dash[0]}px ${dash[0]! + dash[1]!}px) 1`);
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

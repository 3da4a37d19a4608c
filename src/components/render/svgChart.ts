/**
 * A static SVG drawing of a ChartSpec, rendered on the server so that search, print and readers
 * without JavaScript see the chart; the chart element replaces it with a live chart.js canvas.
 */
import type { ChartSpec } from '../../calculators/types.ts';
import type { UnitSystem } from '../../core/units/index.ts';
import { displayUnit, escapeHtml, formatNumber, toDisplay } from './format.ts';
import { simplifyPolyline } from './polyline.ts';

/** Largest shift of a drawn line, in viewBox units (the chart is ~480 px wide on screen). */
const LINE_TOLERANCE = 0.25;

const W = 480;
const H = 256;
const PAD = { l: 56, r: 12, t: 10, b: 34 };

function scaler(lo: number, hi: number, a: number, b: number, log: boolean) {
  const f = log ? Math.log10 : (v: number) => v;
  const l = f(lo);
  const h = f(hi) === l ? l + 1 : f(hi);
  return (v: number) => a + ((f(v) - l) / (h - l)) * (b - a);
}

export function svgChart(spec: ChartSpec, system: UnitSystem): string {
  const ux = displayUnit(spec.x.kind, system);
  const uy = displayUnit(spec.y.kind, system);
  const xlog = spec.x.scale === 'log';
  const ylog = spec.y.scale === 'log';
  const xs: number[] = [];
  const ys: number[] = [];
  for (const s of spec.series) {
    s.x.forEach((v) => { const d = toDisplay(v, ux); if (Number.isFinite(d) && (!xlog || d > 0)) xs.push(d); });
    s.y.forEach((v) => { const d = toDisplay(v, uy); if (Number.isFinite(d) && (!ylog || d > 0)) ys.push(d); });
  }
  if (xs.length === 0 || ys.length === 0) return '';
  const x0 = spec.x.min !== undefined ? toDisplay(spec.x.min, ux) : xs.reduce((a, b) => Math.min(a, b), Infinity); // no spread: a long series would overflow the stack
  const x1 = spec.x.max !== undefined ? toDisplay(spec.x.max, ux) : xs.reduce((a, b) => Math.max(a, b), -Infinity);
  const y0 = spec.y.min !== undefined ? toDisplay(spec.y.min, uy) : ys.reduce((a, b) => Math.min(a, b), Infinity);
  const y1 = spec.y.max !== undefined ? toDisplay(spec.y.max, uy) : ys.reduce((a, b) => Math.max(a, b), -Infinity);
  const sx = scaler(x0, x1, PAD.l, W - PAD.r, xlog);
  const sy = scaler(y0, y1, H - PAD.b, PAD.t, ylog);
  const parts: string[] = [];
  parts.push(`<rect class="svg-axis" x="${PAD.l}" y="${PAD.t}" width="${W - PAD.l - PAD.r}" height="${H - PAD.t - PAD.b}"/>`);
  for (const m of spec.markers ?? []) {
    const mx = sx(toDisplay(m.x, ux));
    if (mx >= PAD.l && mx <= W - PAD.r) parts.push(`<line class="svg-marker" x1="${mx.toFixed(1)}" x2="${mx.toFixed(1)}" y1="${PAD.t}" y2="${H - PAD.b}"/>`);
  }
  for (const s of spec.series) {
    const px: number[] = [];
    const py: number[] = [];
    for (let i = 0; i < Math.min(s.x.length, s.y.length); i++) {
      const dx = toDisplay(s.x[i]!, ux);
      const dy = toDisplay(s.y[i]!, uy);
      if (!Number.isFinite(dx) || !Number.isFinite(dy) || (xlog && dx <= 0) || (ylog && dy <= 0)) continue;
      px.push(sx(dx));
      py.push(Math.min(Math.max(sy(dy), PAD.t), H - PAD.b));
    }
    const tone = `tone-${s.tone ?? 0}`;
    if (s.style === 'points') {
      for (let i = 0; i < px.length; i++) parts.push(`<circle class="${tone}" cx="${px[i]!.toFixed(1)}" cy="${py[i]!.toFixed(1)}" r="3.5" fill="none" stroke-width="2"/>`);
    } else {
      // every sample enters the simplification, so narrow peaks are kept (no every-n-th thinning)
      const pts = simplifyPolyline(px, py, LINE_TOLERANCE).map((i) => `${px[i]!.toFixed(1)},${py[i]!.toFixed(1)}`);
      parts.push(`<polyline class="svg-line ${tone}${s.style === 'dash' ? ' dash' : ''}" points="${pts.join(' ')}"/>`);
    }
  }
  const tick = (v: number) => escapeHtml(formatNumber(v, 3));
  parts.push(`<text class="svg-tick" x="${PAD.l}" y="${H - PAD.b + 14}">${tick(x0)}</text>`);
  parts.push(`<text class="svg-tick" x="${W - PAD.r}" y="${H - PAD.b + 14}" text-anchor="end">${tick(x1)}</text>`);
  parts.push(`<text class="svg-tick" x="${(PAD.l + W - PAD.r) / 2}" y="${H - 4}" text-anchor="middle">${escapeHtml(spec.x.label)}${ux.symbol ? ` [${escapeHtml(ux.symbol)}]` : ''}</text>`);
  parts.push(`<text class="svg-tick" x="${PAD.l - 4}" y="${H - PAD.b}" text-anchor="end">${tick(y0)}</text>`);
  parts.push(`<text class="svg-tick" x="${PAD.l - 4}" y="${PAD.t + 8}" text-anchor="end">${tick(y1)}</text>`);
  parts.push(`<text class="svg-tick" x="12" y="${(PAD.t + H - PAD.b) / 2}" text-anchor="middle" transform="rotate(-90 12 ${(PAD.t + H - PAD.b) / 2})">${escapeHtml(spec.y.label)}${uy.symbol ? ` [${escapeHtml(uy.symbol)}]` : ''}</text>`);
  return `<svg viewBox="0 0 ${W} ${H}" preserveAspectRatio="none" aria-hidden="true" focusable="false">${parts.join('')}</svg>`;
}

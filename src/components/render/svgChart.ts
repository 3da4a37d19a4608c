/**
 * A static SVG drawing of a ChartSpec, rendered on the server so that search, print and readers
 * without JavaScript see the chart; the chart element replaces it with a live chart.js canvas.
 */
import type { ChartSpec } from '../../calculators/types.ts';
import type { UnitSystem } from '../../core/units/index.ts';
import { displayUnit, escapeHtml, formatNumber, toDisplay } from './format.ts';
import { simplifyPolyline } from './polyline.ts';
import { chooseTicks, niceRange, tickOffset, type TickOptions } from '../render/ticks.ts';
import { seriesDash, seriesStyle } from '../render/palette.ts';

/** Largest shift of a drawn line, in viewBox units (the chart is ~480 px wide on screen). */
const LINE_TOLERANCE = 0.25;

const W = 480;
const H = 256;
const PAD = { l: 56, r: 12, t: 10, b: 34 };
/** Tick label font is 10 viewBox units: a digit is about 0.6 of that wide, a line 12 high. */
const CHAR = 6;
const LINE = 12;

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
  const xo: TickOptions = { log: xlog, lengthPx: W - PAD.l - PAD.r, charPx: CHAR, along: 'width' };
  const yo: TickOptions = { log: ylog, lengthPx: H - PAD.t - PAD.b, charPx: CHAR, along: 'height', lineHeightPx: LINE };
  // no spread: a long series would overflow the stack
  const xr = niceRange(spec.x.min !== undefined ? toDisplay(spec.x.min, ux) : xs.reduce((a, b) => Math.min(a, b), Infinity),
    spec.x.max !== undefined ? toDisplay(spec.x.max, ux) : xs.reduce((a, b) => Math.max(a, b), -Infinity), xo, { lo: spec.x.min !== undefined, hi: spec.x.max !== undefined });
  const yr = niceRange(spec.y.min !== undefined ? toDisplay(spec.y.min, uy) : ys.reduce((a, b) => Math.min(a, b), Infinity),
    spec.y.max !== undefined ? toDisplay(spec.y.max, uy) : ys.reduce((a, b) => Math.max(a, b), -Infinity), yo, { lo: spec.y.min !== undefined, hi: spec.y.max !== undefined });
  const [x0, x1, y0, y1] = [xr.lo, xr.hi, yr.lo, yr.hi];
  const sx = scaler(x0, x1, PAD.l, W - PAD.r, xlog);
  const sy = scaler(y0, y1, H - PAD.b, PAD.t, ylog);
  const parts: string[] = [];
  const xt = chooseTicks(x0, x1, xo);
  const yt = chooseTicks(y0, y1, yo);
  for (const t of xt) {
    const px = (PAD.l + tickOffset(t.value, x0, x1, xo)).toFixed(1);
    parts.push(`<line class="svg-grid" x1="${px}" x2="${px}" y1="${PAD.t}" y2="${H - PAD.b}"/>`);
    parts.push(`<text class="svg-tick" data-axis="x" x="${px}" y="${H - PAD.b + 12}" text-anchor="middle">${escapeHtml(t.label)}</text>`);
  }
  for (const t of yt) {
    const py = (H - PAD.b - tickOffset(t.value, y0, y1, yo)).toFixed(1);
    parts.push(`<line class="svg-grid" x1="${PAD.l}" x2="${W - PAD.r}" y1="${py}" y2="${py}"/>`);
    parts.push(`<text class="svg-tick" data-axis="y" x="${PAD.l - 4}" y="${py}" dy="3.5" text-anchor="end">${escapeHtml(t.label)}</text>`);
  }
  parts.push(`<rect class="svg-axis" x="${PAD.l}" y="${PAD.t}" width="${W - PAD.l - PAD.r}" height="${H - PAD.t - PAD.b}"/>`);
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
    const { colour } = seriesStyle(s.tone);
    if (s.style === 'points') {
      for (let i = 0; i < px.length; i++) parts.push(`<circle cx="${px[i]!.toFixed(1)}" cy="${py[i]!.toFixed(1)}" r="3.5" fill="none" stroke="${colour}" stroke-width="2"/>`);
    } else {
      // every sample enters the simplification, so narrow peaks are kept (no every-n-th thinning)
      const pts = simplifyPolyline(px, py, LINE_TOLERANCE).map((i) => `${px[i]!.toFixed(1)},${py[i]!.toFixed(1)}`);
      const dash = seriesDash(s.tone, s.style);
      parts.push(`<polyline class="svg-line${s.style === 'thin' ? ' thin' : ''}" stroke="${colour}"${dash.length ? ` stroke-dasharray="${dash.join(' ')}"` : ''} points="${pts.join(' ')}"/>`);
    }
  }
  for (const m of spec.markers ?? []) {
    const v = toDisplay(m.x, ux);
    const mx = sx(v);
    if (!(mx >= PAD.l && mx <= W - PAD.r)) continue;
    parts.push(`<line class="svg-marker${m.operating ? ' operating' : ''}" x1="${mx.toFixed(1)}" x2="${mx.toFixed(1)}" y1="${PAD.t}" y2="${H - PAD.b}"/>`);
    if (m.operating) {
      // the label sits inside the frame on the side with more room
      const left = mx > (PAD.l + W - PAD.r) / 2;
      const text = `this case ${formatNumber(v, 3)}${ux.symbol ? ` ${ux.symbol}` : ''}`;
      parts.push(`<text class="svg-tick svg-operating" x="${(mx + (left ? -3 : 3)).toFixed(1)}" y="${PAD.t + 10}" text-anchor="${left ? 'end' : 'start'}">${escapeHtml(text)}</text>`);
    }
  }
  parts.push(`<text class="svg-tick" x="${(PAD.l + W - PAD.r) / 2}" y="${H - 4}" text-anchor="middle">${escapeHtml(spec.x.label)}${ux.symbol ? ` [${escapeHtml(ux.symbol)}]` : ''}</text>`);
  parts.push(`<text class="svg-tick" x="12" y="${(PAD.t + H - PAD.b) / 2}" text-anchor="middle" transform="rotate(-90 12 ${(PAD.t + H - PAD.b) / 2})">${escapeHtml(spec.y.label)}${uy.symbol ? ` [${escapeHtml(uy.symbol)}]` : ''}</text>`);
  return `<svg viewBox="0 0 ${W} ${H}" preserveAspectRatio="none" aria-hidden="true" focusable="false">${parts.join('')}</svg>`;
}

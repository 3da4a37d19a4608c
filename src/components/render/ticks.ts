/**
 * Axis ticks and their labels, shared by the static SVG (render/svgChart.ts) and the live
 * chart.js charts (client/chart-view.ts), so both follow the same rules:
 * - linear axes step 1-2-5 × 10^n; log axes tick at decades, adding 2 and 5 (on an axis shorter
 *   than a decade also 2-4-6-8 or every integer multiple) only where the labels have room, and thin the decades
 *   (every 2nd, 3rd, …) where even those would collide;
 * - labels never overlap: each label's extent along the axis (text width on a horizontal axis,
 *   line height on a vertical one, from a character-width estimate) is measured against the
 *   axis length in px;
 * - one number format per axis: a linear axis prints every label with the same decimals (in
 *   engineering notation with one shared exponent outside 1e-3…1e5), a log axis prints every
 *   label plain or every label as m·e±n — never a mixture ("0.60.81", "100000 50000").
 * Pure: numbers in display units in, values and strings out; no DOM.
 */

export interface AxisTick { readonly value: number; readonly label: string }

export interface TickOptions {
  readonly log: boolean;
  /** Axis length in px (or viewBox units). */
  readonly lengthPx: number;
  /** Estimated width of one label character in the same units. */
  readonly charPx: number;
  /** 'width': labels sit side by side (x axis); 'height': labels stack (y axis). */
  readonly along: 'width' | 'height';
  /** Label height on a vertical axis; default 2 × charPx. */
  readonly lineHeightPx?: number;
  /** Least free space between neighbouring labels; default 1 × charPx side by side, 0.3 × line height stacked. */
  readonly gapPx?: number;
}

const PLAIN_LO = 1e-3;
const PLAIN_HI = 1e5;
/** Clean a multiple of a step (0.1 × 3 = 0.30000000000000004). */
const clean = (v: number): number => (v === 0 ? 0 : Number(v.toPrecision(12)));

/** Extent of a label along the axis. */
export function labelExtent(label: string, o: TickOptions): number {
  return o.along === 'width' ? label.length * o.charPx : o.lineHeightPx ?? 2 * o.charPx;
}

/** Where a value sits along the axis, in px from the low end. */
export function tickOffset(v: number, lo: number, hi: number, o: TickOptions): number {
  const f = o.log ? Math.log10 : (x: number) => x;
  const span = f(hi) - f(lo);
  return span > 0 ? ((f(v) - f(lo)) / span) * o.lengthPx : 0;
}

/** Least free space kept between neighbouring labels. */
export function labelGap(o: TickOptions): number {
  return o.gapPx ?? (o.along === 'width' ? o.charPx : 0.3 * (o.lineHeightPx ?? 2 * o.charPx));
}

/** True when two neighbouring labels come closer than the gap (or overlap). */
export function collides(ticks: readonly AxisTick[], lo: number, hi: number, o: TickOptions): boolean {
  const gap = labelGap(o);
  for (let i = 1; i < ticks.length; i++) {
    const a = ticks[i - 1]!;
    const b = ticks[i]!;
    const room = tickOffset(b.value, lo, hi, o) - tickOffset(a.value, lo, hi, o);
    if (room < (labelExtent(a.label, o) + labelExtent(b.label, o)) / 2 + gap) return true;
  }
  return false;
}

/** Labels of a linear axis: the same decimals everywhere, one shared exponent when large or small. */
export function linearLabels(values: readonly number[], step: number): string[] {
  const top = values.reduce((a, v) => Math.max(a, Math.abs(v)), 0); // no spread: long inputs
  const exp = top >= PLAIN_HI || (top > 0 && top < PLAIN_LO) ? 3 * Math.floor(Math.log10(top) / 3) : 0;
  const scale = 10 ** exp;
  const decimals = Math.max(0, -Math.floor(Math.log10(step / scale) + 1e-9));
  return values.map((v) => {
    const s = (v / scale).toFixed(Math.min(decimals, 20));
    const m = /^-0(\.0*)?$/.test(s) ? s.slice(1) : s; // no "-0.0"
    // zero carries no exponent: "0 50e3 100e3" reads better than "0e3"
    return exp === 0 ? m : v === 0 ? '0' : `${m}e${exp}`;
  });
}

/** Labels of a log axis: all plain when every value lies in 1e-3…1e5, else all m·e±n. */
export function logLabels(values: readonly number[]): string[] {
  const plain = values.every((v) => v >= PLAIN_LO && v < PLAIN_HI);
  return values.map((v) => {
    if (plain) return String(clean(v));
    const [m, e] = v.toExponential(6).split('e');
    return `${String(Number(m))}e${e!.replace('+', '')}`;
  });
}

/** 1-2-5 steps from about span/200 up to a step wider than the span. */
function linearSteps(span: number): number[] {
  const out: number[] = [];
  const e0 = Math.floor(Math.log10(span / 200));
  for (let e = e0; e <= e0 + 4; e++) for (const m of [1, 2, 5]) out.push(clean(m * 10 ** e));
  return out;
}

function linearTicks(lo: number, hi: number, o: TickOptions): AxisTick[] {
  const span = hi - lo;
  if (!(span > 0)) return [{ value: lo, label: linearLabels([lo], Math.abs(lo) || 1)[0]! }];
  // at most one tick per ~40 px: denser grids are unreadable even when the labels would fit
  const most = Math.max(2, Math.floor(o.lengthPx / 40) + 1);
  let last: AxisTick[] = [];
  for (const step of linearSteps(span)) {
    const values: number[] = [];
    for (let k = Math.ceil(lo / step - 1e-9); k * step <= hi + step * 1e-9; k++) {
      const v = clean(k * step);
      if (v >= lo - span * 1e-9 && v <= hi + span * 1e-9 && (!o.log || v > 0)) values.push(v);
    }
    if (values.length > most) continue;
    const labels = linearLabels(values, step);
    const ticks = values.map((value, i) => ({ value, label: labels[i]! }));
    if (ticks.length >= 1 && !collides(ticks, lo, hi, o)) return ticks;
    if (ticks.length >= 1) last = ticks;
  }
  return last.length ? [last[0]!] : [];
}

/** Mantissa sets for a log axis, densest first; `every` thins the decades. */
const LOG_SETS: readonly (readonly number[])[] = [[1, 2, 3, 4, 5, 6, 7, 8, 9], [1, 2, 4, 6, 8], [1, 2, 5], [1]];

function logTicks(lo: number, hi: number, o: TickOptions): AxisTick[] {
  const d0 = Math.floor(Math.log10(lo));
  const d1 = Math.ceil(Math.log10(hi));
  const most = Math.max(2, Math.floor(o.lengthPx / 28) + 1);
  const pick = (set: readonly number[], every: number): AxisTick[] => {
    const values: number[] = [];
    for (let d = d0; d <= d1; d++) {
      if (((d % every) + every) % every !== 0) continue;
      for (const m of set) {
        const v = clean(m * 10 ** d);
        if (v >= lo * (1 - 1e-9) && v <= hi * (1 + 1e-9)) values.push(v);
      }
    }
    const labels = logLabels(values);
    return values.map((value, i) => ({ value, label: labels[i]! }));
  };
  // the denser sets (3, 4, 6, 7, 8, 9) only on an axis shorter than a decade: across decades the
  // reader wants decades, with 2 and 5 where there is room
  const short = Math.log10(hi / lo) < 1;
  const candidates: AxisTick[][] = LOG_SETS.filter((s) => short || s.length <= 3).map((s) => pick(s, 1));
  for (let every = 2; every <= Math.max(2, d1 - d0); every++) candidates.push(pick([1], every));
  let fallback: AxisTick[] = [];
  for (const ticks of candidates) {
    if (ticks.length > most) continue;
    if (ticks.length >= 2 && !collides(ticks, lo, hi, o)) return ticks;
    if (ticks.length === 1 && fallback.length === 0) fallback = ticks;
  }
  // a short axis (less than a factor ~2) may hold no two "nice" log values: tick it linearly
  const lin = linearTicks(lo, hi, o);
  return lin.length >= 2 || fallback.length === 0 ? lin : fallback;
}

/** The ticks of an axis from lo to hi (display units; both > 0 on a log axis). */
export function chooseTicks(lo: number, hi: number, o: TickOptions): AxisTick[] {
  if (!Number.isFinite(lo) || !Number.isFinite(hi) || !(o.lengthPx > 0)) return [];
  if (hi < lo) return chooseTicks(hi, lo, o);
  if (o.log && lo > 0 && hi > lo) return logTicks(lo, hi, o);
  return linearTicks(lo, hi, { ...o, log: false });
}

/**
 * A linear axis's range widened to whole steps of its ticks (so the frame ends on a labelled
 * value); a log axis, or an end the chart fixes, stays as given.
 */
export function niceRange(lo: number, hi: number, o: TickOptions, fixed: { lo?: boolean; hi?: boolean } = {}): { lo: number; hi: number } {
  if (o.log || !(hi > lo)) return { lo, hi };
  const t = linearTicks(lo, hi, o);
  if (t.length < 2) return { lo, hi };
  const step = t[1]!.value - t[0]!.value;
  return {
    lo: fixed.lo ? lo : clean(Math.floor(lo / step + 1e-9) * step),
    hi: fixed.hi ? hi : clean(Math.ceil(hi / step - 1e-9) * step),
  };
}

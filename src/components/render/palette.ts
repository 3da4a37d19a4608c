/**
 * The series palette of every chart (static SVG and live chart.js): eight slots, each a colour
 * AND a dash pattern, so that up to eight series differ twice over — on screen by hue, in
 * greyscale print by lightness step and dash. Slot n is `ChartSeries.tone = n`. The colours are
 * our own choice, spread in hue and lightness; test/components/palette.test.ts checks their
 * pairwise CIE76 ΔE and that no two slots share a dash pattern. The CSS variables --tone-0…7 in
 * src/styles/base.css repeat the colours for legends and other CSS; the test keeps them equal.
 */

export interface SeriesStyle {
  readonly colour: string;
  /** On/off lengths in px; [] is solid. */
  readonly dash: readonly number[];
}

export const PALETTE: readonly SeriesStyle[] = [
  { colour: '#1f5f8b', dash: [] },
  { colour: '#a4512a', dash: [7, 3] },
  { colour: '#3f7f4a', dash: [2, 2] },
  { colour: '#8c3f7a', dash: [9, 3, 2, 3] },
  { colour: '#55606a', dash: [4, 4] },
  { colour: '#b08a1e', dash: [12, 4] },
  { colour: '#4fa3c7', dash: [1, 3] },
  { colour: '#1a1a1a', dash: [6, 2, 2, 2, 2, 2] },
];

/** The style of palette slot n (wraps past 8). */
export function seriesStyle(tone: number | undefined): SeriesStyle {
  const n = Math.trunc(tone ?? 0);
  return PALETTE[((n % PALETTE.length) + PALETTE.length) % PALETTE.length]!;
}

/** Dash pattern a series draws with: its slot's, or a plain dash for `style: 'dash'` on the solid slot. */
export function seriesDash(tone: number | undefined, style: string | undefined): readonly number[] {
  const d = seriesStyle(tone).dash;
  return d.length === 0 && style === 'dash' ? [6, 4] : d;
}

/**
 * Quantities inside chart summaries and other sentences a calculator writes: `q(0.025, 'length')`
 * puts a token into the text that the page renders in the reader's unit system ("25 mm" or
 * "0.9843 in"), so a sentence never shows SI numbers under a US heading. The tokens use Unicode
 * private-use characters, which no typed or computed text contains; `renderQuantities` replaces
 * every token, and whatever is not a well-formed token is left as it is.
 */
import type { QuantityKind } from '../core/units/index.ts';

const OPEN = '\uE000';
const SEP = '\uE001';
const CLOSE = '\uE002';

/** A quantity (SI value) to be shown in the reader's units with `digits` significant digits. */
export function q(value: number, kind: QuantityKind, digits = 4): string {
  return `${OPEN}${kind}${SEP}${value}${SEP}${digits}${CLOSE}`;
}

/** Replaces every quantity token with `format(value, kind, digits)`. */
export function renderQuantities(text: string, format: (value: number, kind: QuantityKind, digits: number) => string): string {
  return text.replace(/\uE000([A-Za-z]+)\uE001([^\uE000-\uE002]*)\uE001(\d+)\uE002/g, (_, kind: string, v: string, d: string) => format(Number(v), kind as QuantityKind, Number(d)));
}

/** True when the text still holds a token character (a renderer forgot to render it). */
export function hasQuantityToken(text: string): boolean {
  return /[\uE000-\uE002]/.test(text);
}

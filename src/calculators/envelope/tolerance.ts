/**
 * A tolerance as a reader writes it: "±15%" (or "+-15%", "15%") of the nominal value, or an
 * absolute range "lo..hi" whose ends may carry a unit ("0.9..1.1 kN·s/m"). Pure text handling:
 * the caller converts the ends (the CLI as `--in` does: a plain number is SI; the page in the
 * field's shown unit), so both edges convert through their usual unit path.
 */
import { InputRangeError } from '../../core/errors.ts';

export type Tolerance =
  | { readonly type: 'percent'; readonly percent: number }
  | { readonly type: 'range'; readonly lo: string; readonly hi: string };

/** Longest tolerance text read (two numbers with units fit several times over). */
export const MAX_TOLERANCE_TEXT = 120;

const PERCENT = /^(?:±|\+-|\+\/-)?\s*(\d+(?:\.\d*)?|\.\d+)(?:e[-+]?\d+)?\s*%$/i;

/** Reads a tolerance for input `key`; throws an InputRangeError naming it when the text is neither form. */
export function parseTolerance(key: string, text: string): Tolerance {
  const t = text.trim();
  if (t.length > MAX_TOLERANCE_TEXT) throw new InputRangeError(key, `${t.length} characters`, undefined, '', 'too long for a tolerance');
  const p = PERCENT.exec(t);
  if (p) {
    const percent = Number(t.replace(/^(?:±|\+-|\+\/-)/, '').replace('%', '').trim());
    if (!Number.isFinite(percent) || percent <= 0 || percent >= 100) {
      throw new InputRangeError(key, t, undefined, '', 'a ± tolerance must be more than 0 % and less than 100 %');
    }
    return { type: 'percent', percent };
  }
  const dots = t.indexOf('..');
  if (dots > 0 && t.indexOf('..', dots + 2) < 0) {
    const lo = t.slice(0, dots).trim();
    const hi = t.slice(dots + 2).trim();
    if (lo !== '' && hi !== '') return { type: 'range', lo, hi };
  }
  throw new InputRangeError(key, t, undefined, '', 'write a tolerance as ±15% or as low..high, e.g. 34..46');
}

/** The low and high ends (SI) of a ± % tolerance about a nominal value; refuses a zero nominal. */
export function percentEnds(key: string, nominal: number, percent: number): { lo: number; hi: number } {
  if (nominal === 0) throw new InputRangeError(key, nominal, undefined, '', 'a ± % tolerance of zero is no range; give low..high');
  const d = Math.abs(nominal) * percent / 100;
  return { lo: nominal - d, hi: nominal + d };
}

/**
 * Typed errors of the computation core. Every failure the core can report is one of these,
 * so callers (page widget, CLI, record import) can show a message at the right place
 * instead of a NaN or a stack trace.
 */

/** Base class: every error the core throws on purpose. */
export class DampbookError extends Error {
  override name = 'DampbookError';
}

/** Describes an allowed interval for an input, in SI units. */
export interface Range {
  readonly min: number;
  readonly max: number;
  /** When true the lower bound itself is not allowed (e.g. mass > 0). */
  readonly minExclusive?: boolean | undefined;
  readonly maxExclusive?: boolean | undefined;
}

/** Formats a range as "(0, 1e6] kg" style interval notation. */
export function formatRange(range: Range, unit: string): string {
  const lo = range.minExclusive ? '(' : '[';
  const hi = range.maxExclusive ? ')' : ']';
  const u = unit ? ` ${unit}` : '';
  return `${lo}${fmt(range.min)}, ${fmt(range.max)}${hi}${u}`;
}

function fmt(x: number): string {
  if (x === Infinity) return '∞';
  if (x === -Infinity) return '-∞';
  return String(Number(x.toPrecision(6)));
}

/** An input is missing, not a number, or outside its allowed range. Names the input. */
export class InputRangeError extends DampbookError {
  override name = 'InputRangeError';
  constructor(
    readonly input: string,
    readonly value: unknown,
    readonly range: Range | undefined,
    readonly unit: string,
    detail?: string,
  ) {
    super(InputRangeError.describe(input, value, range, unit, detail));
  }

  private static describe(input: string, value: unknown, range: Range | undefined, unit: string, detail?: string): string {
    const shown = value === undefined ? 'missing' : typeof value === 'string' ? JSON.stringify(value.slice(0, 40)) : String(value);
    const allowed = range ? `; allowed ${formatRange(range, unit)}` : '';
    return `input '${input}' = ${shown}${detail ? ` (${detail})` : ''}${allowed}`;
  }
}

/** A combination of valid inputs for which the method has no answer (e.g. no peaks in a record). */
export class ComputationError extends DampbookError {
  override name = 'ComputationError';
}

/** Checks that `value` is a finite number inside `range`; throws InputRangeError naming `input` otherwise. */
export function requireInRange(input: string, value: number, range: Range, unit = ''): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new InputRangeError(input, value, range, unit, 'not a finite number');
  }
  const belowMin = range.minExclusive ? value <= range.min : value < range.min;
  const aboveMax = range.maxExclusive ? value >= range.max : value > range.max;
  if (belowMin || aboveMax) throw new InputRangeError(input, value, range, unit);
  return value;
}

/** A positive finite number: (0, ∞). */
export const POSITIVE: Range = { min: 0, max: Infinity, minExclusive: true, maxExclusive: true };
/** A non-negative finite number: [0, ∞). */
export const NON_NEGATIVE: Range = { min: 0, max: Infinity, maxExclusive: true };

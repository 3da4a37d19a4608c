/**
 * A decimal number as people type it and CSV files hold it: optional sign, digits with an optional
 * point, optional exponent ("12", "-0.5", ".25", "1.2e3"). No unit, no thousands separators, no
 * "Infinity" or hex (which Number() would accept). One definition for every reader of number text.
 */
export const PLAIN_NUMBER = /^[-+]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][-+]?\d+)?$/;

/** True when `text` (surrounding spaces allowed) is a plain decimal number. */
export function isPlainNumber(text: string): boolean {
  return PLAIN_NUMBER.test(text.trim());
}

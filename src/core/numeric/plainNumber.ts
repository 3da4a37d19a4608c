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

/**
 * True for a number written with a decimal comma, alone or before a unit ("1,5", "2,5e3", "1,5 kg").
 * The handbook refuses it everywhere (page fields, addresses, CLI): in many locales "1,5" means
 * 1.5, in others "1,500" means 1500, and a calculation must not guess which.
 */
export function hasDecimalComma(text: string): boolean {
  return /^\s*[-+]?\d*,\d+(?:[eE][-+]?\d+)?(?:\s*[^\s\d,.].*)?\s*$/.test(text);
}

/** The one message for a decimal comma, on the page and in the CLI. */
export const DECIMAL_COMMA = 'Use a decimal point (1.5, not 1,5): the handbook reads numbers the same way everywhere.';

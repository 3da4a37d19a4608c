/**
 * The one comparison helper for reference values. A failure prints the case, inputs, expected,
 * computed, the difference and the tolerance with its justification, so a red test explains itself.
 */
import { expect } from 'vitest';
import { relativeDifference, withinTolerance } from '../../src/core/numeric/index.ts';

export interface CloseCheck {
  readonly label: string;
  readonly computed: number;
  readonly expected: number;
  /** Relative tolerance; absolute when expected is 0. */
  readonly tol: number;
  readonly why?: string;
  readonly inputs?: unknown;
}

/** The product's one comparison rule (verification, record replay and these tests agree). */
export const relDiff = relativeDifference;

export function expectClose(c: CloseCheck): void {
  const d = relDiff(c.computed, c.expected);
  const ok = withinTolerance(c.computed, c.expected, c.tol);
  if (!ok) {
    const msg = `${c.label}: computed ${c.computed}, expected ${c.expected}, rel. diff ${d.toExponential(3)} > tol ${c.tol}` +
      (c.why ? ` (${c.why})` : '') + (c.inputs !== undefined ? `; inputs ${JSON.stringify(c.inputs)}` : '');
    expect.fail(msg);
  }
  expect(ok).toBe(true);
}

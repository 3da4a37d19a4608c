/**
 * The one comparison helper for reference values. A failure prints the case, inputs, expected,
 * computed, the difference and the tolerance with its justification, so a red test explains itself.
 */
import { expect } from 'vitest';

export interface CloseCheck {
  readonly label: string;
  readonly computed: number;
  readonly expected: number;
  /** Relative tolerance; absolute when expected is 0. */
  readonly tol: number;
  readonly why?: string;
  readonly inputs?: unknown;
}

export function relDiff(computed: number, expected: number): number {
  return expected === 0 ? Math.abs(computed) : Math.abs(computed - expected) / Math.abs(expected);
}

export function expectClose(c: CloseCheck): void {
  const d = relDiff(c.computed, c.expected);
  const ok = Number.isFinite(c.computed) && d <= c.tol;
  if (!ok) {
    const msg = `${c.label}: computed ${c.computed}, expected ${c.expected}, rel. diff ${d.toExponential(3)} > tol ${c.tol}` +
      (c.why ? ` (${c.why})` : '') + (c.inputs !== undefined ? `; inputs ${JSON.stringify(c.inputs)}` : '');
    expect.fail(msg);
  }
  expect(ok).toBe(true);
}

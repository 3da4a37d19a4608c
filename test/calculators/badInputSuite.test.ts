/**
 * The bad-input rules as a src function (`dampbook check --content` runs them on a team's own
 * calculators): every built-in passes them, and a calculator that says NaN, throws an untyped
 * error or cannot compute its own defaults is caught (the checker can fail). Invariants only: no reference values.
 */
import { describe, expect, it } from 'vitest';
import { badInputProblems } from '../../src/calculators/badInput/suite.ts';
import { getCalculator } from '../../src/calculators/registry.ts';
import { defineCalculator, num } from '../../src/calculators/types.ts';
import { ComputationError } from '../../src/core/errors.ts';

const broken = (compute: (x: number) => number | string) => defineCalculator({
  id: 'broken', title: 'Broken', summary: 'A calculator that breaks the rules on purpose.',
  inputs: [{ key: 'x', label: 'x', kind: 'length', default: 1, min: 0, max: 10, help: 'any' }],
  outputs: [{ key: 'y', label: 'y', kind: 'text' }],
  compute: (v) => ({ outputs: { y: compute(num(v, 'x')) }, warnings: [] }),
  verification: [], sources: [],
});

describe('badInputProblems', () => {
  it.each(['sdof', 'log-decrement', 'steady-temperature'])('finds nothing wrong with the built-in %s', (id) => {
    expect(badInputProblems(getCalculator(id)!, { seed: 1, runs: 50 })).toEqual([]);
  });

  it('finds a text output saying NaN, an untyped error and defaults that do not compute', () => {
    // evaluate() itself refuses a non-finite number output; a text output is the calculator's own
    expect(badInputProblems(broken((x) => `regime ${Math.log(x - 0.5)}`), { seed: 1, runs: 50 }).join('\n')).toMatch(/output 'y' says regime NaN/);
    expect(badInputProblems(broken((x) => { if (x > 5) throw new Error('boom'); return String(x); }), { seed: 1, runs: 50 }).join('\n')).toMatch(/threw Error: boom, not a typed error/);
    // evaluate() turns an error naming no input into a ComputationError; defaults that fail are the calculator's own fault
    expect(badInputProblems(broken((x) => { if (x === 1) throw new ComputationError('no answer at 1 m'); return String(x); }), { seed: 1, runs: 50 }).join('\n')).toMatch(/the defaults do not compute: no answer at 1 m/);
  });
});

/** Every duty calculator, at both ends of every input range and for every damper law, gives finite outputs or a typed error. */
import { describe, expect, it } from 'vitest';
import { defaults, evaluate } from '../../../src/calculators/evaluate.ts';
import { dutyCalculators } from '../../../src/calculators/duty/index.ts';
import type { ChoiceInput } from '../../../src/calculators/types.ts';
import { DampbookError } from '../../../src/core/errors.ts';

describe.each(dutyCalculators.map((c) => [c.id, c] as const))('%s at the ends of its input ranges', (_id, calc) => {
  it('computes finite outputs and charts, or throws a typed error naming the problem', () => {
    const lawDef = calc.inputs.find((i) => i.key === 'law') as ChoiceInput | undefined;
    const laws = lawDef ? lawDef.options.map((o) => o.value) : [undefined];
    for (const d of calc.inputs) {
      if (d.kind === 'choice' || d.kind === 'text') continue;
      const ends = [d.minExclusive ? (d.min === 0 ? 1e-9 : d.min * (1 + 1e-6)) : d.min, d.max * (d.maxExclusive ? 1 - 1e-6 : 1)];
      for (const v of ends) {
        for (const law of laws) {
          const raw = { ...defaults(calc), [d.key]: v, ...(law ? { law } : {}) };
          try {
            const r = evaluate(calc, raw);
            for (const ch of calc.charts?.(r.values, r) ?? []) for (const s of ch.series) expect(s.y.every(Number.isFinite)).toBe(true);
          } catch (e) {
            if (!(e instanceof DampbookError)) throw new Error(`${calc.id}: ${d.key} = ${v}${law ? `, law ${law}` : ''}: ${String(e)}`);
          }
        }
      }
    }
  }, 60_000);
});

/**
 * The study vocabulary: every name a calculator binds exists, and a quantity name means one
 * physical thing in one kind, so every bound input and published output has the quantity's kind.
 */
import { describe, expect, it } from 'vitest';
import { calculators } from '../../src/calculators/registry.ts';
import { STUDY_QUANTITIES, studyQuantity } from '../../src/studies/quantities.ts';

const bound = calculators.filter((c) => c.study);

describe('study vocabulary', () => {
  it('binds the thermal, duty and vibration calculators that share physical things', () => {
    const ids = bound.map((c) => c.id);
    for (const id of ['road-power', 'harmonic-duty', 'impact', 'forced-response', 'steady-temperature', 'warm-up', 'damping-fade', 'power-rating', 'body-cooling']) expect(ids).toContain(id);
  });

  it.each(bound.map((c) => [c.id, c] as const))('%s: every bound input exists and has its quantity\'s kind', (_id, calc) => {
    for (const [key, name] of Object.entries(calc.study!.inputs ?? {})) {
      const input = calc.inputs.find((i) => i.key === key);
      expect(input, `${calc.id}: no input '${key}'`).toBeDefined();
      const quantity = studyQuantity(name);
      expect(quantity, `${calc.id}.${key}: unknown study quantity '${name}'`).toBeDefined();
      expect(input!.kind, `${calc.id}.${key} → ${name}`).toBe(quantity!.kind);
    }
  });

  it.each(bound.map((c) => [c.id, c] as const))('%s: every published output exists and has its quantity\'s kind', (_id, calc) => {
    for (const [key, name] of Object.entries(calc.study!.publishes ?? {})) {
      const output = calc.outputs.find((o) => o.key === key);
      expect(output, `${calc.id}: no output '${key}'`).toBeDefined();
      const quantity = studyQuantity(name);
      expect(quantity, `${calc.id}.${key}: unknown study quantity '${name}'`).toBeDefined();
      expect(output!.kind, `${calc.id}.${key} → ${name}`).toBe(quantity!.kind);
      expect(quantity!.role, `${name} is a limit: no step publishes a limit`).toBe('value');
    }
  });

  it('a bound choice input offers options every other binding of the same quantity shares at least one of', () => {
    const options = new Map<string, Set<string>[]>();
    for (const c of bound) for (const [key, name] of Object.entries(c.study!.inputs ?? {})) {
      const input = c.inputs.find((i) => i.key === key);
      if (input?.kind === 'choice') options.set(name, [...(options.get(name) ?? []), new Set(input.options.map((o) => o.value))]);
    }
    for (const [name, sets] of options) {
      const common = [...sets[0]!].filter((v) => sets.every((s) => s.has(v)));
      expect(common.length, `${name}: no option common to every binding`).toBeGreaterThan(0);
    }
  });

  it('every value quantity is used by some calculator (limits: by the verdicts) and has a help text', () => {
    const used = new Set(bound.flatMap((c) => [...Object.values(c.study!.inputs ?? {}), ...Object.values(c.study!.publishes ?? {})]));
    for (const quantity of STUDY_QUANTITIES) {
      if (quantity.role === 'value') expect(used.has(quantity.name), `${quantity.name} is bound nowhere`).toBe(true);
      expect(quantity.help.length).toBeGreaterThan(10);
    }
  });
});

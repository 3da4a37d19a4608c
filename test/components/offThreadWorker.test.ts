/**
 * The worker side of off-thread computing answers with the same numbers as evaluate() on the main
 * thread, as plain data (structured-clone safe), and reports a refused input by name (behaviour;
 * the numbers are those of the calculator's own verified core, compared with themselves).
 */
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/calculators/evaluate.ts';
import { calculators, getCalculator } from '../../src/calculators/registry.ts';
import { answer, serve, type Reply } from '../../src/components/client/off-thread-worker.ts';

const defaults = (id: string) => Object.fromEntries(getCalculator(id)!.inputs.map((d) => [d.key, d.default]));

describe('off-thread worker', () => {
  const marked = calculators.filter((c) => c.offMainThread);
  it('has calculators to serve (those marked offMainThread)', () => {
    expect(marked.map((c) => c.id)).toEqual(expect.arrayContaining(['road-power', 'damper-simulation', 'warm-up']));
  });
  for (const calc of marked) {
    it(`${calc.id}: the same outputs as evaluate() here, charts included, all of it cloneable`, async () => {
      const values = evaluate(calc, defaults(calc.id)).values;
      const r = await answer({ seq: 7, id: calc.id, values, charts: true });
      expect(r.ok && r.seq).toBe(7);
      if (!r.ok) return;
      expect(r.result.outputs).toEqual(evaluate(calc, values).outputs);
      if (calc.charts) expect(r.charts?.length).toBeGreaterThan(0);
      expect(structuredClone(r)).toEqual(r); // what crosses postMessage
    });
  }
  it('names the input a computation refuses, as the page expects', async () => {
    const values = { ...evaluate(getCalculator('road-power')!, defaults('road-power')).values, V: -5 };
    const r = await answer({ seq: 1, id: 'road-power', values, charts: false });
    expect(r.ok).toBe(false);
    if (!r.ok) { expect(r.known).toBe(true); expect(r.message).toMatch(/V|speed/); }
  });
  it('answers an unknown calculator with a message, not a throw', async () => {
    const r = await answer({ seq: 2, id: 'no-such', values: {}, charts: false });
    expect(r).toMatchObject({ ok: false, known: false });
  });
  it('serve() posts one reply per job', async () => {
    const posted: Reply[] = [];
    const scope = { onmessage: null as ((e: MessageEvent) => void) | null, postMessage: (m: Reply) => posted.push(m) };
    serve(scope);
    scope.onmessage!({ data: { seq: 3, id: 'sdof', values: evaluate(getCalculator('sdof')!, defaults('sdof')).values, charts: false } } as MessageEvent);
    await expect.poll(() => posted.length).toBe(1);
    expect(posted[0]).toMatchObject({ seq: 3, ok: true });
  });
});

/**
 * One damper model everywhere: every calculator with a `law` input, as `dampbook list --json`
 * reports it, uses exactly the canonical law keys with their quantity kinds (CLI contract, see
 * src/calculators/shared/damperLawInputs.ts). Contract test of the project's own interface: no external
 * reference value is involved.
 */
import { describe, expect, it } from 'vitest';
import { main } from '../../../src/cli/main.ts';
import { calculators, getCalculator } from '../../../src/calculators/registry.ts';
import { evaluate } from '../../../src/calculators/evaluate.ts';
import { lawChart } from '../../../src/calculators/shared/damperLawChart.ts';
import { LAW_KEYS } from '../../../src/calculators/shared/damperLawInputs.ts';
import { LEGACY_LAW_KEYS } from '../../../src/calculators/shared/damperLawMigrate.ts';

/** The parameters each law needs. */
const PARAMS: Record<string, readonly string[]> = {
  linear: ['c'], power: ['Fref', 'vref', 'alpha'], coulomb: ['Ff'], bilinear: ['c1', 'c2', 'c1c', 'c2c', 'vknee'], hysteretic: ['eta', 'kh'],
};
/** road-power's `ks` has been its suspension spring since 0.1 (CLI contract): it offers no series stiffness. */
const KS_IS_NOT_SERIES = new Set(['road-power']);

interface Listed { id: string; inputs: { key: string; kind: string; options?: string[]; optional: boolean }[] }

async function listed(): Promise<Listed[]> {
  const out: string[] = [];
  expect(await main(['list', '--json'], (s) => out.push(s), () => {})).toBe(0);
  return JSON.parse(out.join('\n')) as Listed[];
}

describe('canonical damper-law keys', async () => {
  const withLaw = (await listed()).filter((c) => c.inputs.some((i) => i.key === 'law'));

  it('finds the calculators that take a law', () => {
    for (const id of ['energy-per-cycle', 'damper-simulation', 'harmonic-duty', 'recorded-motion', 'road-power']) expect(withLaw.map((c) => c.id)).toContain(id);
  });

  it.each(withLaw.map((c) => [c.id, c] as const))('%s: law is a choice among the five laws, every law key has its canonical kind, no old key', (_id, c) => {
    const law = c.inputs.find((i) => i.key === 'law')!;
    expect(law.kind).toBe('choice');
    for (const o of law.options ?? []) expect(Object.keys(PARAMS)).toContain(o);
    for (const i of c.inputs) {
      expect(Object.keys(LEGACY_LAW_KEYS), `${c.id} still has the old key ${i.key}`).not.toContain(i.key);
      if (i.key === 'ks' && KS_IS_NOT_SERIES.has(c.id)) continue;
      if (i.key in LAW_KEYS) expect(i.kind, `${c.id}.${i.key}`).toBe(LAW_KEYS[i.key as keyof typeof LAW_KEYS]);
    }
    const ks = c.inputs.find((i) => i.key === 'ks');
    if (ks && !KS_IS_NOT_SERIES.has(c.id)) expect(ks.optional, `${c.id}.ks is optional (empty = rigid)`).toBe(true);
  });

  it.each(withLaw.map((c) => [c.id, c] as const))('%s: a calculator that takes law parameters has all of each offered law', (_id, c) => {
    const keys = new Set(c.inputs.map((i) => i.key));
    const law = c.inputs.find((i) => i.key === 'law')!;
    const takesParams = Object.values(PARAMS).flat().some((k) => keys.has(k) && calculators.find((d) => d.id === c.id)!.inputs.find((i) => i.key === k)?.when?.key === 'law');
    if (!takesParams) return;
    for (const o of law.options ?? []) for (const k of PARAMS[o]!) expect(keys.has(k), `${c.id}: law ${o} needs ${k}`).toBe(true);
  });

  it('every input shown only for some laws is a canonical law key', () => {
    for (const c of calculators) for (const i of c.inputs) if (i.when?.key === 'law') expect(Object.keys(LAW_KEYS), `${c.id}.${i.key}`).toContain(i.key);
  });

  it.each(['energy-per-cycle', 'harmonic-duty', 'damper-simulation'])('%s draws its law with the shared force–velocity chart', (id) => {
    const calc = getCalculator(id)!;
    const r = evaluate(calc, { law: 'bilinear' });
    const title = lawChart({ kind: 'linear', c: 1 }, 1).title;
    expect(calc.charts!(r.values, r).some((c) => c.title === title)).toBe(true);
  });
});

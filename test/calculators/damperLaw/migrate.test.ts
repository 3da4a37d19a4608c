/**
 * Old damper-law keys map to the canonical ones with a note (migrate.ts), and the mapped inputs
 * give the results the old keys gave. The checks compare the calculator with itself and with closed
 * forms named at each case; provenance: closed form.
 */
import { describe, expect, it } from 'vitest';
import { migrateLawKeys } from '../../../src/calculators/shared/damperLawMigrate.ts';
import { evaluate } from '../../../src/calculators/evaluate.ts';
import { getCalculator } from '../../../src/calculators/registry.ts';
import { makeRecord, replayRecord } from '../../../src/records/replay.ts';

const epc = getCalculator('energy-per-cycle')!;
const sim = getCalculator('damper-simulation')!;

describe('migrateLawKeys', () => {
  it('reads c with the power law as Fref = C at vref = 1 m/s', () => {
    const m = migrateLawKeys(epc, { law: 'power', c: 800, alpha: 0.5 });
    expect(m.raw).toEqual({ law: 'power', Fref: 800, vref: 1, alpha: 0.5 });
    expect(m.notes.join(' ')).toMatch(/'c' with law=power is deprecated/);
  });

  it('turns the rebound and compression factors into four slopes (old defaults 2000/600 N·s/m, factors 1 and 0.4)', () => {
    expect(migrateLawKeys(epc, { law: 'bilinear', c1: 3000, c2: 900, cRebound: 1.2, cCompression: 0.4 }).raw).toMatchObject({ c1: 3600, c2: 1080, c1c: 1200, c2c: 360 });
    expect(migrateLawKeys(epc, { law: 'bilinear', cCompression: 0.5 }).raw).toMatchObject({ c1: 2000, c2: 600, c1c: 1000, c2c: 300 });
    expect(migrateLawKeys(epc, { law: 'bilinear', c1: '10 lbf·s/in', cRebound: 2, cCompression: 1 }).raw.c1).toBeCloseTo((2 * 10 * 4.4482216152605) / 0.0254, 6);
  });

  it('refuses factors given with compression slopes, naming the input', () => {
    expect(() => migrateLawKeys(epc, { law: 'bilinear', cCompression: 0.4, c1c: 800 })).toThrow(/'cCompression'/);
  });

  it('refuses an old power-law C with a unit (its unit depends on α)', () => {
    expect(() => migrateLawKeys(epc, { law: 'power', c: '800 lbf.s/in' })).toThrow(/'c'.*SI base units/);
  });

  it('takes k as the hysteretic stiffness on energy-per-cycle and damper-simulation, keeping k', () => {
    const m = migrateLawKeys(sim, { law: 'hysteretic', eta: 0.1, k: 16000 });
    expect(m.raw).toMatchObject({ k: 16000, kh: 16000 });
    expect(migrateLawKeys(getCalculator('harmonic-duty')!, { law: 'hysteretic', k: 1 }).raw.kh).toBeUndefined();
  });

  it('leaves canonical inputs alone, without notes', () => {
    const raw = { law: 'power', Fref: 800, vref: 0.5, alpha: 0.5 };
    expect(migrateLawKeys(epc, raw)).toEqual({ raw, notes: [] });
  });

  it('gives the old results: power law P = 50.911 W (λ(0.5)·C·ω^α·X^(1+α), FEMA 274 §9.3 from memory)', () => {
    const r = evaluate(epc, migrateLawKeys(epc, { law: 'power', c: 800, alpha: 0.5, X: 0.025, f: 1.5 }).raw);
    expect(r.outputs.P as number).toBeCloseTo(50.911, 3);
  });

  it('replays an old record written with cRebound/cCompression and the hysteretic k, with a warning', () => {
    const now = evaluate(epc, { law: 'bilinear', c1: 3000, c2: 900, c1c: 1200, c2c: 360, vknee: 0.1, X: 0.05, f: 2 });
    const rec = makeRecord(epc, now.values, now.outputs, {}, { coreVersion: '0.2.0' }, new Date('2026-11-01T10:00:00Z'));
    const old = { ...rec, inputs: { law: { value: 'bilinear' }, c1: { value: 3000, unit: 'N.s/m' }, c2: { value: 900, unit: 'N.s/m' }, vknee: { value: 0.1, unit: 'm/s' }, cRebound: { value: 1 }, cCompression: { value: 0.4 }, X: { value: 0.05, unit: 'm' }, f: { value: 2, unit: 'Hz' } } };
    const r = replayRecord(epc, old, { coreVersion: '0.2.0' });
    expect(r.ok, r.ok ? '' : r.message).toBe(true);
    if (r.ok) {
      expect(r.diffs).toEqual([]);
      expect(r.warnings.join(' ')).toMatch(/cRebound and cCompression are deprecated/);
    }
  });
});

/**
 * The study runner: demo studies run, bindings hold exactly, inputs resolve in the documented
 * order with their origin, and broken or hostile studies fail with one line naming the step and
 * input. Figures compared here are the calculators' own outputs (closed forms are checked on the
 * calculator pages); the study adds no arithmetic of its own.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/calculators/evaluate.ts';
import { getCalculator } from '../../src/calculators/registry.ts';
import { runStudy } from '../../src/studies/run.ts';
import { readStudies } from '../../src/studies/files.ts';
import { parseStudy, validateStudy, type Study } from '../../src/studies/schema.ts';
import { changeBetween, staleSteps } from '../../src/studies/stale.ts';

const DIR = 'content/studies';
const files = readdirSync(DIR).filter((f) => f.endsWith('.json'));
const load = (f: string): Study => {
  const p = parseStudy(readFileSync(join(DIR, f), 'utf8'));
  if (!p.ok) throw new Error(p.message);
  return p.study;
};
const clone = (s: Study): Study => JSON.parse(JSON.stringify(s)) as Study;
const fail = (s: unknown): string => {
  const v = validateStudy(s);
  if (!v.ok) return v.message;
  try { runStudy(v.study, getCalculator); } catch (e) { return (e as Error).message; }
  return 'ran';
};
const fellrunner = () => load('tw-210-rear-damper-class-d.json');

describe('demo studies', () => {
  it('holds the Fellrunner failing and passing variants and the Packline end stop', () => {
    expect(files).toEqual(expect.arrayContaining(['tw-210-rear-damper-class-d.json', 'tw-210-rear-damper-class-c.json', 'tw-118-end-stop.json']));
  });

  it.each(files)('%s runs, and every from binding holds exactly (input value = source output)', (f) => {
    const run = runStudy(load(f), getCalculator);
    const byId = new Map(run.steps.map((s) => [s.id, s]));
    let bindings = 0;
    for (const s of run.steps) {
      for (const [key, ref] of Object.entries(s.from)) {
        const [sid, out] = ref.split('.') as [string, string];
        expect(s.inputs[key], `${s.id}.${key} ← ${ref}`).toBe(byId.get(sid)!.outputs[out]);
        bindings++;
      }
      // every step recomputes to the same outputs from the inputs it recorded
      const again = evaluate(getCalculator(s.calculator)!, s.inputs, { fillDefaults: false });
      expect(again.outputs).toEqual(s.outputs);
    }
    expect(bindings).toBeGreaterThan(0);
    expect(run.verdicts.length).toBeGreaterThan(0);
  });

  it('Fellrunner class D: mean power flows road → steady → warm-up → fade → rating, and the body fails its limits', () => {
    const run = runStudy(fellrunner(), getCalculator);
    const [road, steady, warm, fade, rating] = run.steps;
    expect(steady!.from).toMatchObject({ P: 'road.P' });
    expect(warm!.from).toMatchObject({ P: 'road.P', UA: 'steady.UA' });
    expect(fade!.from).toMatchObject({ P: 'road.P', Cth: 'warm-up.CthTotal' });
    expect(steady!.inputs.V).toBe(15); // the study's vehicle speed reaches the body's air speed
    expect(warm!.inputs.Tamb).toBeCloseTo(308.15, 12); // 35 °C from the study
    expect(warm!.inputs.Tlimit).toBeCloseTo(393.15, 12); // 120 °C limit
    expect(road!.origins.roadClass).toEqual({ kind: 'typed' });
    expect(steady!.origins.V).toEqual({ kind: 'study', quantity: 'vehicleSpeed' });
    expect(warm!.origins.Tlimit).toEqual({ kind: 'limit', quantity: 'allowedTemperature' });
    expect(warm!.origins.Ttouch).toEqual({ kind: 'default' });
    // warm-up's equilibrium T∞ + P/UA with UA at T_s is T_s itself (closed form, same arithmetic)
    expect(warm!.outputs.Tss as number).toBeCloseTo(steady!.outputs.Ts as number, 9);
    const verdict = Object.fromEntries(run.verdicts.map((v) => [v.check, v]));
    expect(verdict['steady-temperature']!.pass).toBe(false);
    expect(verdict['time-to-limit']!.pass).toBe(false);
    expect(verdict['time-to-limit']!.value).toBe(warm!.outputs.tLimit);
    expect(verdict['power-rating']).toMatchObject({ value: road!.outputs.P, limit: rating!.outputs.Pmax, pass: false });
    expect(verdict.surroundings!.pass).toBe(true);
    // fade at the actual equilibrium, above the 120 °C limit: more than the fade at the limit
    expect(fade!.outputs.Teq).toBeUndefined();
    expect(verdict.fade!.value!).toBeGreaterThan(fade!.outputs.fade as number);
    expect(verdict['steady-temperature']!.restsOn).toEqual(expect.arrayContaining(['P', 'V', 'allowedTemperature']));
    // road holding and travel: the road step's own outputs against the limits (3σ for the Gaussian travel)
    expect(verdict['tyre-load']).toMatchObject({ value: road!.outputs.tyreLoadRatio, limit: 0.33, pass: false });
    expect(verdict.travel!.value).toBeCloseTo(3 * (road!.outputs.travelRms as number), 15);
    expect(verdict.travel).toMatchObject({ limit: 0.08, pass: true });
  });

  it('a warm-up step that cycles the power refuses the study\'s mean power as its power while on', () => {
    const u = fellrunner();
    u.steps[2]!.inputs = { ...(u.steps[2]!.inputs ?? {}), duty: 0.5 };
    expect(() => runStudy(u, getCalculator)).toThrow(/step 'warm-up' \(warm-up\): P \(the power while on\) came from the study's mean power, but the power is on for only 0.5/);
    u.steps[2]!.inputs = { ...u.steps[2]!.inputs, P: 485 };
    expect(() => runStudy(u, getCalculator)).not.toThrow();
  });

  it('TW-118 end stop: energy per stroke ½mv² + F_p·s and per hour against the buffer ratings', () => {
    const file = readStudies().find((f) => f.id === 'tw-118-end-stop')!;
    const run = runStudy(file.study, getCalculator);
    const v = Object.fromEntries(run.verdicts.map((x) => [x.check, x]));
    // closed form (Meriam & Kraige, Engineering Mechanics: Dynamics, work–energy, §3/6): ½·12·1.5² + 60·0.025 = 15 J
    expect(v['stroke-energy']).toMatchObject({ value: 15, limit: 25, pass: true, margin: 10 });
    expect(v['hourly-energy']!.value).toBeCloseTo(15 * 900, 9);
    expect(v['hourly-energy']).toMatchObject({ limit: 30000, pass: true });
  });

  it('Fellrunner class C and the Packline end stop pass every verdict', () => {
    for (const f of ['tw-210-rear-damper-class-c.json', 'tw-118-end-stop.json']) {
      for (const v of runStudy(load(f), getCalculator).verdicts) expect(v.pass, `${f}: ${v.step} ${v.check}`).toBe(true);
    }
  });
});

describe('resolving inputs', () => {
  it('a local override beats a published quantity, and an explicit from beats the study quantity', () => {
    const s = clone(fellrunner());
    s.steps[1]!.inputs = { P: 100 };
    s.steps[4]!.from = { V: 'road.vRms' }; // same kind (velocity): allowed, if odd
    const run = runStudy(s, getCalculator);
    expect(run.steps[4]!.inputs.V).toBe(run.steps[0]!.outputs.vRms);
    expect(run.steps[4]!.origins.V).toEqual({ kind: 'step', step: 'road', output: 'vRms', explicit: true });
    expect(run.steps[1]!.inputs.P).toBe(100);
    expect(run.steps[1]!.origins.P).toEqual({ kind: 'typed' });
    expect(run.steps[2]!.origins.P).toEqual({ kind: 'step', step: 'road', output: 'P', explicit: false });
  });

  it('an inactive input is neither used nor recorded (no input of an unused law)', () => {
    const run = runStudy(fellrunner(), getCalculator);
    expect(run.steps[0]!.inputs).not.toHaveProperty('Fref');
    expect(run.steps[0]!.origins).not.toHaveProperty('alpha');
    expect(run.steps[3]!.inputs).not.toHaveProperty('X');
  });

  it('a required input that nothing gives fails naming the step and input', () => {
    const s = clone(fellrunner());
    delete s.quantities!.sprungMass;
    expect(fail(s)).toBe(`study: step 'road' input 'ms': input 'ms' = missing (required); allowed [1, 20000] kg: no override, binding or study quantity gives it`);
  });

  it('steps run in binding order whatever the listed order', () => {
    const s = clone(fellrunner());
    s.steps.reverse();
    s.steps.find((x) => x.id === 'steady')!.from = { P: 'road.P' };
    s.steps.find((x) => x.id === 'warm-up')!.from = { UA: 'steady.UA', P: 'road.P' };
    const ids = runStudy(s, getCalculator).steps.map((x) => x.id);
    expect(ids.indexOf('road')).toBeLessThan(ids.indexOf('steady'));
    expect(ids.indexOf('steady')).toBeLessThan(ids.indexOf('warm-up'));
  });
});

describe('refused studies: one line each', () => {
  const oneLine = (m: string) => expect(m).not.toMatch(/\n/);
  it('dangling binding: no such step, no such output', () => {
    const s = clone(fellrunner());
    s.steps[1]!.from = { P: 'roadd.P' };
    const m = fail(s);
    expect(m).toBe(`study: step 'steady' input 'P': bound to roadd.P, but there is no step 'roadd'`);
    s.steps[1]!.from = { P: 'road.Pmean' };
    expect(fail(s)).toBe(`study: step 'steady' input 'P': bound to road.Pmean, but road-power has no output 'Pmean'`);
    oneLine(m);
  });

  it('cycle', () => {
    const s = clone(fellrunner());
    s.steps[0]!.from = { ms: 'rating.area' };
    expect(fail(s)).toBe(`study: step 'road' input 'ms': bound to rating.area (area), but 'ms' is mass`);
    s.steps[0]!.from = {};
    s.steps[1]!.from = { P: 'warm-up.Pmean' };
    s.steps[2]!.from = { UA: 'steady.UA' };
    expect(fail(s)).toBe(`study: steps 'steady' → 'warm-up' → 'steady' form a cycle of bindings`);
  });

  it('unknown calculator, unknown input, misplaced check, missing limit', () => {
    const s = clone(fellrunner());
    s.steps[1]!.calculator = 'steady-temp';
    expect(fail(s)).toBe(`study: step 'steady': unknown calculator 'steady-temp'`);
    const t = clone(fellrunner());
    t.steps[0]!.inputs = { speed: 3 };
    expect(fail(t)).toBe(`study: step 'road' input 'speed': road-power has no such input`);
    const u = clone(fellrunner());
    u.steps[0]!.checks = ['fade'];
    expect(fail(u)).toBe(`study: step 'road': check 'fade' applies to damping-fade, not road-power`);
    const w = clone(fellrunner());
    delete w.limits!.dutyLength;
    expect(fail(w)).toBe(`study: step 'warm-up': check 'time-to-limit' needs the limit 'dutyLength'`);
  });

  it('an invalid value names the step and input; an unknown quantity or bad unit names the quantity', () => {
    const s = clone(fellrunner());
    s.steps[0]!.inputs = { roadClass: 'Z' };
    expect(fail(s)).toMatch(/^study: step 'road' input 'roadClass': input 'roadClass' = "Z" \(choose one of A, /);
    const t = clone(fellrunner());
    t.quantities!.vehicleSpeed = '15 parsecs';
    expect(fail(t)).toMatch(/^study: quantity 'vehicleSpeed' = "15 parsecs": /);
    const u = clone(fellrunner());
    u.quantities!.speed = 3;
    expect(fail(u)).toBe(`study: quantity 'speed' is not a study quantity`);
    const w = clone(fellrunner());
    w.quantities!.airTemperature = '80 °C';
    expect(fail(w)).toMatch(/^study: step 'road'|^study: step 'steady' input 'Tamb' \(from the study's airTemperature\): input 'Tamb' = 353.15/);
  });

  it('hostile payloads', () => {
    const base = fellrunner();
    expect(fail(JSON.parse(`{"__proto__": {"x": 1}, ${JSON.stringify(base).slice(1)}`))).toBe(`Not a valid study: it contains the forbidden key '__proto__'.`);
    expect(fail({ ...base, extra: 1 })).toMatch(/^Not a valid study: the study: Unrecognized key\(s\) in object: 'extra'\.$/);
    let deep: unknown = 1;
    for (let i = 0; i < 10; i++) deep = { a: deep };
    expect(fail({ ...base, quantities: deep })).toBe('Not a valid study: it nested too deeply.');
    expect(fail({ ...base, title: '<script>' })).toBe('Not a valid study: title: plain text.');
    expect(parseStudy('x'.repeat(300_000))).toEqual({ ok: false, message: 'Not a valid study: 300000 characters; at most 200000.' });
    expect(parseStudy('{')).toEqual({ ok: false, message: 'Not a valid study: the file is not JSON.' });
    expect(fail({ ...base, steps: [{ ...base.steps[0], inputs: { constructor: 1 } }] })).toBe(`Not a valid study: it contains the forbidden key 'constructor'.`);
    for (const m of [fail({ ...base, version: 2 }), fail({ ...base, steps: [] })]) oneLine(m);
  });
});

describe('stale steps', () => {
  it('a changed vehicle speed makes every step stale; a changed road class makes the road and its consumers stale', () => {
    const before = fellrunner();
    const run = runStudy(before, getCalculator);
    const faster = clone(before);
    faster.quantities!.vehicleSpeed = '20 m/s';
    expect(staleSteps(run, changeBetween(before, faster), getCalculator)).toEqual(['road', 'steady', 'warm-up', 'fade', 'rating']);
    const rougher = clone(before);
    rougher.steps[0]!.inputs = { roadClass: 'E' };
    expect(staleSteps(run, changeBetween(before, rougher), getCalculator)).toEqual(['road', 'steady', 'warm-up', 'fade']);
    const oil = clone(before);
    oil.quantities!.oilViscosity40 = '30 mm²/s';
    expect(staleSteps(run, changeBetween(before, oil), getCalculator)).toEqual(['fade']);
    expect(staleSteps(run, changeBetween(before, clone(before)), getCalculator)).toEqual([]);
  });

  it('the recomputed study after a speed change differs in every stale step (numbers, not only a flag)', () => {
    const before = runStudy(fellrunner(), getCalculator);
    const s = fellrunner();
    s.quantities!.vehicleSpeed = '20 m/s';
    const after = runStudy(s, getCalculator);
    // on a w = 2 road the mean power is proportional to speed (closed form π²·k_t·G_d(n0)·n0²·V)
    expect(after.steps[0]!.outputs.P as number).toBeCloseTo((before.steps[0]!.outputs.P as number) * 20 / 15, 6);
    expect(after.steps[1]!.inputs.P).toBe(after.steps[0]!.outputs.P);
    expect(after.steps[2]!.inputs.UA).toBe(after.steps[1]!.outputs.UA);
  });
});

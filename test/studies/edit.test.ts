/**
 * Writing a page's changes back into a study (src/studies/edit.ts): a change goes where its value
 * came from (study quantity, limit, local override, typed), inputs that do not apply change
 * nothing, an override can be undone, and a study started or extended from a page runs with
 * exactly the values the page computed with. Reference: the study runner itself (closed-loop
 * checks: input value = source output exactly); no physical reference values here.
 */
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/calculators/evaluate.ts';
import { getCalculator } from '../../src/calculators/registry.ts';
import { addStep, applyPageValues, clearOverride, sameValue, startStudy } from '../../src/studies/edit.ts';
import { readStudies } from '../../src/studies/files.ts';
import { runStudy } from '../../src/studies/run.ts';
import { validateStudy } from '../../src/studies/schema.ts';

const classD = readStudies().find((f) => f.id === 'tw-210-rear-damper-class-d')!.study;

describe('page values written back into a study', () => {
  const run = runStudy(classD, getCalculator);
  const road = run.steps.find((s) => s.id === 'road')!;
  const steady = run.steps.find((s) => s.id === 'steady')!;

  it('unchanged values change nothing (the same study object comes back)', () => {
    expect(applyPageValues(classD, run, 'road', road.inputs, getCalculator).study).toBe(classD);
  });

  it('a study quantity changed on one page changes the study quantity, and every later step follows', () => {
    const e = applyPageValues(classD, run, 'road', { ...road.inputs, V: 22 }, getCalculator);
    expect(e.changed).toEqual([{ key: 'V', to: 'quantity', name: 'vehicleSpeed' }]);
    expect(e.study.quantities!.vehicleSpeed).toBe(22);
    expect(classD.quantities!.vehicleSpeed).toBe('15 m/s'); // never mutated
    const after = runStudy(e.study, getCalculator);
    expect(after.steps.find((s) => s.id === 'steady')!.inputs.P).toBe(after.steps.find((s) => s.id === 'road')!.outputs.P);
    expect(after.steps.find((s) => s.id === 'steady')!.inputs.V).toBe(22);
  });

  it('a limit changed on a page changes the limit', () => {
    const warm = run.steps.find((s) => s.id === 'warm-up')!;
    const e = applyPageValues(classD, run, 'warm-up', { ...warm.inputs, Tlimit: 400 }, getCalculator);
    expect(e.changed).toEqual([{ key: 'Tlimit', to: 'limit', name: 'allowedTemperature' }]);
    expect(e.study.limits!.allowedTemperature).toBe(400);
  });

  it('a value from an earlier step changed on a page is a local override, and clearing it follows the step again', () => {
    const e = applyPageValues(classD, run, 'steady', { ...steady.inputs, P: 50 }, getCalculator);
    expect(e.changed).toEqual([{ key: 'P', to: 'override' }]);
    expect(e.study.steps[1]!.inputs).toEqual({ P: 50 });
    expect(runStudy(e.study, getCalculator).steps[1]!.origins.P).toEqual({ kind: 'typed' });
    const back = clearOverride(e.study, 'steady', 'P');
    expect(back.steps[1]!.inputs).toEqual({});
    expect(runStudy(back, getCalculator).steps[1]!.inputs.P).toBe(road.outputs.P);
  });

  it('an input that does not apply under the chosen mode changes nothing (warm-up orientation under a constant loss)', () => {
    const warm = run.steps.find((s) => s.id === 'warm-up')!;
    expect(warm.inputs.loss).toBe('constant');
    const e = applyPageValues(classD, run, 'warm-up', { ...warm.inputs, orientation: 'horizontal' }, getCalculator);
    expect(e.study).toBe(classD);
  });

  it('numbers equal within a unit round trip (1e-9 relative) are the same value', () => {
    expect(sameValue(0.35, 0.35000000000000003)).toBe(true);
    expect(sameValue(1, 1 + 1e-6)).toBe(false);
    expect(sameValue('a', 'a')).toBe(true);
  });
});

describe('a study started and extended from pages', () => {
  const impactValues = evaluate(getCalculator('impact')!, {}).values;
  const steadyValues = evaluate(getCalculator('steady-temperature')!, {}).values;

  it('a started study is a valid study file and its step computes with exactly the page values', () => {
    const s = startStudy('impact', 'impact', impactValues, '2026-12-02', getCalculator);
    expect(validateStudy(s).ok).toBe(true);
    // the page's core version travels with a study started there (src/calculators/changes.ts reads it)
    const stamped = startStudy('impact', 'impact', impactValues, '2026-12-02', getCalculator, '0.4.0');
    expect(validateStudy(stamped).ok && stamped.coreVersion).toBe('0.4.0');
    const r = runStudy(s, getCalculator);
    for (const [k, v] of Object.entries(r.steps[0]!.inputs)) expect(sameValue(v, impactValues[k]), k).toBe(true);
  });

  it('an added step takes what the study gives (the impact mean power) and keeps the rest of the page values', () => {
    const s = addStep(startStudy('impact', 'impact', impactValues, '2026-12-02', getCalculator), 'steady-temperature', 'steady-temperature', steadyValues, getCalculator).study;
    expect(validateStudy(s).ok).toBe(true);
    const r = runStudy(s, getCalculator);
    expect(r.steps[1]!.inputs.P).toBe(r.steps[0]!.outputs.P);
    expect(r.steps[1]!.origins.P).toMatchObject({ kind: 'step', step: 'impact', output: 'P' });
    for (const [k, v] of Object.entries(r.steps[1]!.inputs)) if (k !== 'P') expect(sameValue(v, steadyValues[k]), k).toBe(true);
  });

  it('step ids stay unique when a calculator is added twice', () => {
    const s = startStudy('impact', 'impact', impactValues, '2026-12-02', getCalculator);
    expect(addStep(s, 'impact', 'impact', impactValues, getCalculator).id).toBe('impact-2');
  });
});

/**
 * Runs a study: each step's inputs resolved (local override > explicit `from` > a study quantity
 * published by an earlier step > the study's own quantity or limit > the calculator default where
 * the input is not required), every step through `evaluate()`, the origin of every input kept,
 * then the verdicts. Pure: the same code serves the CLI, the built package page and the tests.
 */
import { evaluate } from '../calculators/evaluate.ts';
import type { Outputs, Values } from '../calculators/types.ts';
import { ComputationError, InputRangeError } from '../core/errors.ts';
import { planStudy, StudyError, type PlannedStep, type StudyPlan } from './plan.ts';
import type { CalculatorLookup } from './lookup.ts';
import type { Study } from './schema.ts';
import { verdictsOf, type Verdict } from './verdicts.ts';

export type Origin =
  | { readonly kind: 'typed' }
  | { readonly kind: 'step'; readonly step: string; readonly output: string; readonly explicit: boolean }
  | { readonly kind: 'study'; readonly quantity: string }
  | { readonly kind: 'limit'; readonly quantity: string }
  | { readonly kind: 'default' };

export interface StepRun {
  readonly id: string;
  readonly calculator: string;
  readonly page: string;
  readonly title: string;
  /** Inputs actually used (active ones only), SI. */
  readonly inputs: Values;
  readonly outputs: Outputs;
  readonly warnings: readonly string[];
  /** The step's hand-off strings (a page showing this step reuses the whole result). */
  readonly handoff?: Readonly<Record<string, string>>;
  readonly origins: Readonly<Record<string, Origin>>;
  /** Inputs filled from step outputs: input key → "stepId.outputKey". */
  readonly from: Readonly<Record<string, string>>;
}

export interface StudyRun {
  readonly study: Study;
  readonly steps: readonly StepRun[];
  readonly verdicts: readonly Verdict[];
}

/** A published quantity: its value and the step output it came from. */
interface Published {
  readonly value: number | string;
  readonly step: string;
  readonly output: string;
}

function resolve(p: PlannedStep, plan: StudyPlan, runs: ReadonlyMap<string, StepRun>, published: ReadonlyMap<string, Published>) {
  const raw: Record<string, unknown> = Object.create(null);
  const origins: Record<string, Origin> = {};
  const bindings = p.calc.study?.inputs ?? {};
  for (const def of p.calc.inputs) {
    const key = def.key;
    const typed = p.step.inputs?.[key];
    const ref = p.from.get(key);
    const q = bindings[key];
    if (typed !== undefined) {
      raw[key] = typed;
      origins[key] = { kind: 'typed' };
    } else if (ref) {
      const v = runs.get(ref[0])!.outputs[ref[1]];
      if (v === undefined) throw new StudyError(`study: step '${p.step.id}' input '${key}': ${ref[0]}.${ref[1]} has no value for these inputs`);
      raw[key] = v;
      origins[key] = { kind: 'step', step: ref[0], output: ref[1], explicit: true };
    } else if (q !== undefined && published.has(q)) {
      const pub = published.get(q)!;
      raw[key] = pub.value;
      origins[key] = { kind: 'step', step: pub.step, output: pub.output, explicit: false };
    } else if (q !== undefined && plan.quantities.has(q)) {
      raw[key] = plan.quantities.get(q);
      origins[key] = { kind: plan.study.limits && q in plan.study.limits ? 'limit' : 'study', quantity: q };
    }
  }
  return { raw, origins };
}

function runStep(p: PlannedStep, plan: StudyPlan, runs: ReadonlyMap<string, StepRun>, published: Map<string, Published>): StepRun {
  const { raw, origins } = resolve(p, plan, runs, published);
  const id = p.step.id;
  let r: ReturnType<typeof evaluate>;
  try {
    r = evaluate(p.calc, raw, { fillDefaults: false });
  } catch (e) {
    if (e instanceof InputRangeError) {
      const o = origins[e.input];
      const via = !o ? '' : o.kind === 'step' ? ` (from ${o.step}.${o.output})` : o.kind === 'study' || o.kind === 'limit' ? ` (from the study's ${o.quantity})` : '';
      const why = o ? e.message : `${e.message}: no override, binding or study quantity gives it`;
      throw new StudyError(`study: step '${id}' input '${e.input}'${via}: ${why}`);
    }
    if (e instanceof ComputationError) throw new StudyError(`study: step '${id}' (${p.calc.id}): ${e.message}`);
    throw e;
  }
  const bound = new Set(Object.entries(origins).filter(([, o]) => o.kind !== 'typed').map(([k]) => k));
  const refused = p.calc.study?.refuse?.(r.values, bound);
  if (refused) throw new StudyError(`study: step '${id}' (${p.calc.id}): ${refused}`);
  const used: Record<string, Origin> = {};
  const from: Record<string, string> = {};
  for (const key of Object.keys(r.values)) {
    const o = origins[key] ?? { kind: 'default' };
    used[key] = o;
    if (o.kind === 'step') from[key] = `${o.step}.${o.output}`;
  }
  for (const [out, q] of Object.entries(p.calc.study?.publishes ?? {})) {
    const v = r.outputs[out];
    if (v !== undefined) published.set(q, { value: v, step: id, output: out });
  }
  return {
    id, calculator: p.calc.id, page: p.step.page, title: p.step.title ?? p.calc.title,
    inputs: r.values, outputs: r.outputs, warnings: r.warnings, ...(r.handoff ? { handoff: r.handoff } : {}), origins: used, from,
  };
}

/** Plans and runs a whole study; throws a one-line StudyError naming the step and input. */
export function runStudy(study: Study, calcs: CalculatorLookup): StudyRun {
  const r = runStudyUntilError(study, calcs);
  if (r.error) throw r.error;
  return r.run;
}

/**
 * Runs the steps in order up to the first one that fails, and keeps what ran: the page a reader
 * is on still shows its step when a later step cannot compute. A study that cannot be planned
 * (unknown calculator, dangling binding, cycle) still throws.
 */
export function runStudyUntilError(study: Study, calcs: CalculatorLookup): { run: StudyRun; error?: StudyError; failedStep?: string } {
  const plan = planStudy(study, calcs);
  const runs = new Map<string, StepRun>();
  const published = new Map<string, Published>();
  const steps: StepRun[] = [];
  const verdicts: Verdict[] = [];
  for (const p of plan.steps) {
    let run: StepRun;
    try {
      run = runStep(p, plan, runs, published);
    } catch (e) {
      if (e instanceof StudyError) return { run: { study, steps, verdicts }, error: e, failedStep: p.step.id };
      throw e;
    }
    runs.set(run.id, run);
    steps.push(run);
    verdicts.push(...verdictsOf(p, run, plan, published));
  }
  return { run: { study, steps, verdicts } };
}

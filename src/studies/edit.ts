/**
 * Changes a reader makes on a step's page, written back into the study. Pure: takes a study, the
 * last run and the values the page now computes with, returns the new study (never mutates).
 *
 * Where a changed value goes follows where it came from, so nothing is typed twice and a local
 * change is never silent:
 * - from the study's own quantity or limit → that quantity changes (every step that reads it follows);
 * - from an earlier step's output → a local override on this step (shown with a mark; cleared with
 *   `clearOverride`, after which the step follows the output again);
 * - typed on this step → stays typed on this step;
 * - a page default of an input bound to a study quantity → the study gains that quantity;
 *   any other default → typed on this step.
 */
import { isActive } from '../calculators/evaluate.ts';
import type { CalculatorLookup } from './lookup.ts';
import type { Values } from '../calculators/types.ts';
import type { Origin, StudyRun } from './run.ts';
import { studyQuantity } from './quantities.ts';
import type { Study, StudyStep } from './schema.ts';

/** The longest text a study file holds in one value (the schema's limit). */
export const MAX_STUDY_TEXT = 6000;

/** Two values are the same when equal as text, or as numbers within 1e-9 relative (a field's round trip through its unit). */
export function sameValue(a: number | string | undefined, b: number | string | undefined): boolean {
  if (typeof a === 'number' && typeof b === 'number') return Math.abs(a - b) <= 1e-9 * Math.max(Math.abs(a), Math.abs(b), 1e-300);
  return a === b;
}

export interface PageEdit {
  readonly study: Study;
  /** Input keys whose value was taken into the study, and where it went. */
  readonly changed: readonly { readonly key: string; readonly to: 'quantity' | 'limit' | 'override' | 'typed'; readonly name?: string }[];
  /** Inputs the study could not take (a text longer than a study value may be). */
  readonly refused: readonly string[];
}

const clone = (s: Study): Study => JSON.parse(JSON.stringify(s)) as Study;

/** Writes the values a step's page computes with into the study (see the module comment). */
export function applyPageValues(study: Study, run: StudyRun, stepId: string, values: Values, calcs: CalculatorLookup): PageEdit {
  const stepRun = run.steps.find((s) => s.id === stepId);
  const next = clone(study);
  const step = next.steps.find((s) => s.id === stepId);
  if (!stepRun || !step) return { study, changed: [], refused: [] };
  const calc = calcs(step.calculator);
  const bindings = calc?.study?.inputs ?? {};
  const changed: PageEdit['changed'][number][] = [];
  const refused: string[] = [];
  for (const [key, v] of Object.entries(values)) {
    // an input that does not apply (a choice under another mode keeps its default) changes nothing
    const def = calc?.inputs.find((d) => d.key === key);
    if (v === undefined || !def || !isActive(def, values) || sameValue(v, stepRun.inputs[key])) continue;
    if (typeof v === 'string' && v.length > MAX_STUDY_TEXT) { refused.push(key); continue; }
    const origin: Origin = stepRun.origins[key] ?? { kind: 'default' };
    const q = bindings[key];
    if (origin.kind === 'study' || origin.kind === 'limit') {
      const group = origin.kind === 'limit' ? 'limits' : 'quantities';
      next[group] = { ...(next[group] ?? {}), [origin.quantity]: v };
      changed.push({ key, to: origin.kind === 'limit' ? 'limit' : 'quantity', name: origin.quantity });
    } else if (origin.kind === 'default' && q !== undefined && studyQuantity(q)) {
      const group = studyQuantity(q)!.role === 'limit' ? 'limits' : 'quantities';
      next[group] = { ...(next[group] ?? {}), [q]: v };
      changed.push({ key, to: group === 'limits' ? 'limit' : 'quantity', name: q });
    } else {
      setTyped(step, key, v);
      changed.push({ key, to: origin.kind === 'step' ? 'override' : 'typed' });
    }
  }
  return { study: changed.length ? next : study, changed, refused };
}

function setTyped(step: StudyStep, key: string, v: number | string): void {
  (step as { inputs?: Record<string, number | string> }).inputs = { ...(step.inputs ?? {}), [key]: v };
  if (step.from && key in step.from) {
    const { [key]: _dropped, ...rest } = step.from;
    (step as { from?: Record<string, string> }).from = rest;
  }
}

/** Removes a step's local value for one input, so it follows the study (or the earlier step) again. */
export function clearOverride(study: Study, stepId: string, key: string): Study {
  const next = clone(study);
  const step = next.steps.find((s) => s.id === stepId);
  if (!step?.inputs || !(key in step.inputs)) return study;
  const { [key]: _dropped, ...rest } = step.inputs;
  (step as { inputs?: Record<string, number | string> }).inputs = rest;
  return next;
}

/** Study quantities some step of the study publishes. */
export function publishedQuantities(study: Study, calcs: CalculatorLookup): Set<string> {
  return new Set(study.steps.flatMap((s) => Object.values(calcs(s.calculator)?.study?.publishes ?? {})));
}

/** True when the study gives a quantity: as its own quantity or limit, or published by one of its steps. */
export function studyKnows(study: Study, q: string, calcs: CalculatorLookup): boolean {
  return q in (study.quantities ?? {}) || q in (study.limits ?? {}) || publishedQuantities(study, calcs).has(q);
}

/**
 * Adds a page's calculator as the last step. Of the values the page computes with now, an input
 * bound to a quantity the study already gives follows the study; one bound to a quantity it does
 * not give yet adds that quantity (so later steps share it); any other input is typed on the step.
 */
export function addStep(study: Study, page: string, calculator: string, values: Values, calcs: CalculatorLookup): { study: Study; id: string } {
  const taken = new Set(study.steps.map((s) => s.id));
  let id = calculator.slice(0, 36);
  for (let n = 2; taken.has(id); n++) id = `${calculator.slice(0, 36)}-${n}`;
  const next = clone(study);
  const calc = calcs(calculator);
  const bindings = calc?.study?.inputs ?? {};
  const inputs: Record<string, number | string> = {};
  for (const def of calc?.inputs ?? []) {
    const v = values[def.key];
    if (v === undefined || !isActive(def, values) || (typeof v === 'string' && v.length > MAX_STUDY_TEXT)) continue;
    const q = bindings[def.key];
    const sq = q === undefined ? undefined : studyQuantity(q);
    if (q !== undefined && studyKnows(study, q, calcs)) continue;
    if (sq) {
      const group = sq.role === 'limit' ? 'limits' : 'quantities';
      next[group] = { ...(next[group] ?? {}), [sq.name]: v };
    } else if (def.required || v !== def.default) {
      // a required input is never taken from the page default by the runner: keep it even at the default
      inputs[def.key] = v;
    }
  }
  next.steps.push({ id, page, calculator, ...(Object.keys(inputs).length ? { inputs } : {}) });
  return { study: next, id };
}

/**
 * A new study with one step, its quantities taken from the values the page computes with now;
 * `coreVersion` (the page's core) lets a later run list the result changes since (changes.ts).
 */
export function startStudy(page: string, calculator: string, values: Values, today: string, calcs: CalculatorLookup, coreVersion?: string): Study {
  const empty: Study = {
    format: 'dampbook-study', version: 1, ...(coreVersion ? { coreVersion } : {}), title: 'New study',
    project: { number: 'TW-000', name: 'Project name', damper: 'Damper description', calculationNo: 'TW-000-C-000', date: today },
    steps: [],
  };
  return addStep(empty, page, calculator, values, calcs).study;
}

/**
 * Which steps a change makes stale: a changed step, and every step whose inputs came (directly or
 * through a published quantity) from a stale step or from a changed study quantity or limit.
 * Pure; reads the origins recorded by the last run.
 */
import type { CalculatorLookup } from './lookup.ts';
import type { Study } from './schema.ts';
import type { StudyRun } from './run.ts';

export interface StudyChange {
  /** Steps whose own inputs, bindings, calculator or checks changed. */
  readonly steps: readonly string[];
  /** Study quantities or limits whose value changed. */
  readonly quantities: readonly string[];
}

const same = (a: unknown, b: unknown) => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

/** The difference between two versions of a study. */
export function changeBetween(before: Study, after: Study): StudyChange {
  const quantities = new Set<string>();
  for (const group of ['quantities', 'limits'] as const) {
    const a = before[group] ?? {};
    const b = after[group] ?? {};
    for (const k of new Set([...Object.keys(a), ...Object.keys(b)])) if (!same(a[k], b[k])) quantities.add(k);
  }
  const old = new Map(before.steps.map((s) => [s.id, s]));
  const steps = after.steps.filter((s) => !same(old.get(s.id), s)).map((s) => s.id);
  return { steps, quantities: [...quantities] };
}

/** Step ids made stale by a change, in run order. */
export function staleSteps(last: StudyRun, change: StudyChange, calcs: CalculatorLookup): string[] {
  const stale = new Set<string>(change.steps);
  const changedQ = new Set(change.quantities);
  for (const s of last.steps) {
    if (stale.has(s.id)) continue;
    const hit = Object.values(s.origins).some((o) =>
      (o.kind === 'step' && stale.has(o.step)) || ((o.kind === 'study' || o.kind === 'limit') && changedQ.has(o.quantity)));
    // a quantity that appears may fill an input that took its default last time
    const bindings = calcs(s.calculator)?.study?.inputs ?? {};
    const appears = Object.entries(bindings).some(([key, q]) => changedQ.has(q) && (s.origins[key] === undefined || s.origins[key]!.kind === 'default'));
    if (hit || appears) stale.add(s.id);
  }
  return last.steps.map((s) => s.id).filter((id) => stale.has(id));
}


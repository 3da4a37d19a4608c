/**
 * Planning a study before anything runs: every calculator known, every bound input and output
 * real and of matching kind, every quantity known and typed, the steps ordered by their explicit
 * `from` bindings (listed order kept otherwise) and cycles refused. Pure; one-line StudyError.
 */
import type { CalculatorLookup } from './lookup.ts';
import type { CalculatorDefinition } from '../calculators/types.ts';
import { DampbookError } from '../core/errors.ts';
import { parseQuantity, UnitError } from '../core/units/index.ts';
import { studyQuantity } from './quantities.ts';
import type { CheckName, Study, StudyStep } from './schema.ts';

export class StudyError extends DampbookError {
  override name = 'StudyError';
}

/** The calculator each check reads (undefined: any step with body inputs). */
export const CHECK_CALCULATOR: Record<CheckName, string | undefined> = {
  'steady-temperature': 'steady-temperature',
  surroundings: undefined,
  'time-to-limit': 'warm-up',
  fade: 'damping-fade',
  'power-rating': 'power-rating',
  'tyre-load': 'road-power',
  travel: 'road-power',
  'stroke-energy': 'impact',
  'hourly-energy': 'impact',
};

/** The limit quantity each check compares against (power-rating: the duty's mean power against P_max). */
export const CHECK_LIMIT: Record<CheckName, string | undefined> = {
  'steady-temperature': 'allowedTemperature',
  surroundings: 'allowedTemperature',
  'time-to-limit': 'dutyLength',
  fade: 'allowedFade',
  'power-rating': undefined,
  'tyre-load': 'allowedTyreLoadRatio',
  travel: 'availableTravel',
  'stroke-energy': 'ratedStrokeEnergy',
  'hourly-energy': 'ratedHourlyEnergy',
};

export interface PlannedStep {
  readonly step: StudyStep;
  readonly calc: CalculatorDefinition;
  /** Explicit bindings: input key → [step id, output key]. */
  readonly from: ReadonlyMap<string, readonly [string, string]>;
}

export interface StudyPlan {
  readonly study: Study;
  /** Steps in run order. */
  readonly steps: readonly PlannedStep[];
  /** Study quantities and limits in SI (choices as text). */
  readonly quantities: ReadonlyMap<string, number | string>;
}

function siValue(name: string, v: number | string, where: string): number | string {
  const q = studyQuantity(name);
  if (!q) throw new StudyError(`study: ${where} '${name}' is not a study quantity`);
  if (q.kind === 'choice') {
    if (typeof v !== 'string') throw new StudyError(`study: ${where} '${name}' = ${v}: give the choice as text`);
    return v;
  }
  if (typeof v === 'number') return v;
  try {
    return parseQuantity(v, q.kind);
  } catch (e) {
    if (e instanceof UnitError) throw new StudyError(`study: ${where} '${name}' = ${JSON.stringify(v.slice(0, 40))}: ${e.message}`);
    throw e;
  }
}

export function planStudy(study: Study, calcs: CalculatorLookup): StudyPlan {
  const quantities = new Map<string, number | string>();
  for (const [group, role] of [['quantities', 'value'], ['limits', 'limit']] as const) {
    for (const [name, v] of Object.entries(study[group] ?? {})) {
      const where = group === 'limits' ? 'limit' : 'quantity';
      const q = studyQuantity(name);
      if (q && q.role !== role) throw new StudyError(`study: ${where} '${name}' belongs under '${q.role === 'limit' ? 'limits' : 'quantities'}'`);
      quantities.set(name, siValue(name, v, where));
    }
  }
  const ids = new Map<string, StudyStep>();
  for (const s of study.steps) {
    if (ids.has(s.id)) throw new StudyError(`study: step id '${s.id}' is used twice`);
    ids.set(s.id, s);
  }
  const planned = new Map<string, PlannedStep>();
  for (const s of study.steps) {
    const calc = calcs(s.calculator);
    if (!calc) throw new StudyError(`study: step '${s.id}': unknown calculator '${s.calculator}'`);
    for (const key of Object.keys(s.inputs ?? {})) {
      if (!calc.inputs.some((i) => i.key === key)) throw new StudyError(`study: step '${s.id}' input '${key}': ${calc.id} has no such input`);
    }
    const from = new Map<string, readonly [string, string]>();
    for (const [key, ref] of Object.entries(s.from ?? {})) {
      const input = calc.inputs.find((i) => i.key === key);
      if (!input) throw new StudyError(`study: step '${s.id}' input '${key}': ${calc.id} has no such input`);
      if (s.inputs && key in s.inputs) throw new StudyError(`study: step '${s.id}' input '${key}': both typed and bound to ${ref}; keep one`);
      const [sid, out] = ref.split('.') as [string, string];
      const src = ids.get(sid);
      if (!src) throw new StudyError(`study: step '${s.id}' input '${key}': bound to ${ref}, but there is no step '${sid}'`);
      const srcCalc = calcs(src.calculator);
      const output = srcCalc?.outputs.find((o) => o.key === out);
      if (srcCalc && !output) throw new StudyError(`study: step '${s.id}' input '${key}': bound to ${ref}, but ${srcCalc.id} has no output '${out}'`);
      if (output && output.kind !== input.kind && !(output.kind === 'text' && (input.kind === 'text' || input.kind === 'choice'))) {
        throw new StudyError(`study: step '${s.id}' input '${key}': bound to ${ref} (${output.kind}), but '${key}' is ${input.kind}`);
      }
      from.set(key, [sid, out]);
    }
    for (const check of s.checks ?? []) {
      const need = CHECK_CALCULATOR[check];
      if (need ? need !== calc.id : !calc.inputs.some((i) => i.key === 'dTsur')) {
        throw new StudyError(`study: step '${s.id}': check '${check}' applies to ${need ?? 'a step with a damper body in air'}, not ${calc.id}`);
      }
      const limit = CHECK_LIMIT[check];
      if (limit && !quantities.has(limit)) throw new StudyError(`study: step '${s.id}': check '${check}' needs the limit '${limit}'`);
    }
    planned.set(s.id, { step: s, calc, from });
  }
  return { study, steps: order(study, planned), quantities };
}

/** Stable topological order by explicit bindings; a cycle is refused naming its steps. */
function order(study: Study, planned: ReadonlyMap<string, PlannedStep>): PlannedStep[] {
  const done = new Set<string>();
  const out: PlannedStep[] = [];
  const visit = (id: string, path: string[]) => {
    if (done.has(id)) return;
    if (path.includes(id)) {
      const cycle = [...path.slice(path.indexOf(id)), id];
      throw new StudyError(`study: steps ${cycle.map((c) => `'${c}'`).join(' → ')} form a cycle of bindings`);
    }
    const p = planned.get(id)!;
    for (const [sid] of p.from.values()) visit(sid, [...path, id]);
    done.add(id);
    out.push(p);
  };
  for (const s of study.steps) visit(s.id, []);
  return out;
}

/**
 * Verdicts: a step's checks against the study's limits, each a pass/fail line with its margin
 * and the inputs it rests on. Values are SI; `value` is what the job does, `limit` what it may do.
 */
import { evaluate } from '../calculators/evaluate.ts';
import type { PlannedStep, StudyPlan } from './plan.ts';
import type { StepRun } from './run.ts';
import type { CheckName } from './schema.ts';

export interface Verdict {
  readonly step: string;
  readonly check: CheckName;
  /** The quantity checked (SI); null when it does not occur (the limit is never reached). */
  readonly value: number | null;
  readonly limit: number;
  readonly pass: boolean;
  /** How far inside (positive) or outside (negative) the limit, SI. */
  readonly margin: number | null;
  /** One line: what was compared. */
  readonly what: string;
  /** The step inputs (and study limits) the verdict rests on. */
  readonly restsOn: readonly string[];
}

const BODY = ['D', 'L', 'Tamb', 'dTsur', 'V', 'flowFactor', 'eps'];
/** Highest temperature the fade search may go to (the damping-fade input's upper bound). */
const FADE_SEARCH_MAX = 673.15;

function present(run: StepRun, keys: readonly string[]): string[] {
  return keys.filter((k) => run.inputs[k] !== undefined);
}

const n = (v: unknown): number => v as number;

/**
 * Peak of a Gaussian response taken as three standard deviations: exceeded about 0.13 % of the
 * time on one side (common practice, no source; the normal distribution's 3σ point).
 */
const GAUSSIAN_PEAK = 3;

/** Value against an upper limit. */
function upTo(base: { step: string; check: CheckName }, value: number, limit: number, what: string, restsOn: string[]): Verdict {
  return { ...base, value, limit, pass: value <= limit, margin: limit - value, what, restsOn };
}

function one(check: CheckName, p: PlannedStep, run: StepRun, plan: StudyPlan, published: ReadonlyMap<string, { value: number | string }>): Verdict {
  const limitOf = (name: string) => plan.quantities.get(name) as number;
  const base = { step: run.id, check };
  switch (check) {
    case 'steady-temperature': {
      const value = n(run.outputs.Ts);
      const limit = limitOf('allowedTemperature');
      return { ...base, value, limit, pass: value <= limit, margin: limit - value, what: 'steady body temperature T_s against the allowed temperature', restsOn: [...present(run, ['P', ...BODY]), 'allowedTemperature'] };
    }
    case 'surroundings': {
      const value = n(run.inputs.Tamb) + n(run.inputs.dTsur ?? 0);
      const limit = limitOf('allowedTemperature');
      return { ...base, value, limit, pass: value < limit, margin: limit - value, what: 'surroundings temperature T∞ + (T_sur − T∞) against the allowed temperature', restsOn: [...present(run, ['Tamb', 'dTsur']), 'allowedTemperature'] };
    }
    case 'time-to-limit': {
      const t = run.outputs.tLimit;
      const limit = limitOf('dutyLength');
      const value = typeof t === 'number' ? t : null;
      return { ...base, value, limit, pass: value === null || value >= limit, margin: value === null ? null : value - limit, what: 'time to the temperature limit against the duty length', restsOn: [...present(run, ['P', 'Cth', 'UA', 'Tamb', 'Tlimit', 'duty', 'period', 'profile']), 'dutyLength'] };
    }
    case 'fade': {
      // the fade at the actual equilibrium, found even above the temperature limit
      let fade = run.outputs.fade;
      if (run.outputs.Teq === undefined) {
        const again = evaluate(p.calc, { ...run.inputs, Tlimit: FADE_SEARCH_MAX }, { fillDefaults: true });
        fade = again.outputs.fade;
      }
      const limit = limitOf('allowedFade');
      if (typeof fade !== 'number') return { ...base, value: null, limit, pass: false, margin: null, what: 'no fade found: the temperature limit is not above the air temperature', restsOn: ['Tamb', 'Tlimit'] };
      return { ...base, value: fade, limit, pass: fade <= limit, margin: limit - fade, what: 'damping lost to fade at the actual equilibrium (above the limit if need be) against the allowed fade', restsOn: [...present(run, ['cRef', 'Tref', 'share', 'nu40', 'nu100', 'duty', 'X', 'f', 'P', ...BODY]), 'allowedFade'] };
    }
    case 'power-rating': {
      const duty = published.get('meanPower')?.value;
      const value = typeof duty === 'number' ? duty : Number.NaN;
      const limit = n(run.outputs.Pmax);
      if (!Number.isFinite(value)) return { ...base, value: null, limit, pass: false, margin: null, what: 'no earlier step gives the duty\'s mean power', restsOn: ['meanPower'] };
      return { ...base, value, limit, pass: value <= limit, margin: limit - value, what: 'duty mean power against the continuous rating P_max', restsOn: ['meanPower', ...present(run, ['Tmax', ...BODY])] };
    }
    case 'tyre-load':
      return upTo(base, n(run.outputs.tyreLoadRatio), limitOf('allowedTyreLoadRatio'), 'RMS dynamic tyre load / static load against the allowed ratio (road holding)', [...present(run, ['roadClass', 'Gd0', 'V', 'ms', 'mu', 'ks', 'kt', 'law', 'c']), 'allowedTyreLoadRatio']);
    case 'travel':
      return upTo(base, GAUSSIAN_PEAK * n(run.outputs.travelRms), limitOf('availableTravel'), 'suspension travel 3 × RMS (exceeded about 0.13 % of the time) against the travel available to the bump stop', [...present(run, ['roadClass', 'Gd0', 'V', 'ms', 'mu', 'ks', 'kt', 'law', 'c']), 'availableTravel']);
    case 'stroke-energy':
      return upTo(base, n(run.outputs.E), limitOf('ratedStrokeEnergy'), 'energy per stroke against the damper\'s rated energy per stroke', [...present(run, ['loadCase', 'm', 'v', 'Fp', 's', 'vertical', 'I', 'omega', 'R', 'M', 'h', 'theta', 'friction', 'n']), 'ratedStrokeEnergy']);
    case 'hourly-energy': {
      // impact derates the rating for the ambient (EhAllow) when it is given one; the verdict uses what the page shows
      const allow = run.outputs.EhAllow;
      const rests = [...present(run, ['loadCase', 'm', 'v', 'Fp', 's', 'vertical', 'I', 'omega', 'R', 'M', 'h', 'theta', 'friction', 'n', 'cph']), 'ratedHourlyEnergy'];
      if (typeof allow === 'number') return upTo(base, n(run.outputs.Ehour), allow, 'energy per hour against the damper\'s rated energy per hour, derated for the ambient', [...rests, ...present(run, ['Tamb', 'Trated', 'Tmax'])]);
      return upTo(base, n(run.outputs.Ehour), limitOf('ratedHourlyEnergy'), 'energy per hour against the damper\'s rated energy per hour', rests);
    }
  }
}

/** The verdicts of one step, in the order its checks are listed. */
export function verdictsOf(p: PlannedStep, run: StepRun, plan: StudyPlan, published: ReadonlyMap<string, { value: number | string }>): Verdict[] {
  return (p.step.checks ?? []).map((c) => one(c, p, run, plan, published));
}

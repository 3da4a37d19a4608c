/** The fv-fit calculator's shared steps (compute and charts): read the sheet, fit, band width. */
import { damperForce, fitDamperLaw, readFvPoints, type DamperLaw, type FitLawKind } from '../../core/dampers/index.ts';
import { ComputationError, InputRangeError } from '../../core/errors.ts';
import { choice, num, text, type Values } from '../types.ts';

/** Parses the sheet and fits the chosen law; a sheet the law cannot describe is named at `points`. */
export function analyseSheet(values: Values) {
  const data = readFvPoints(text(values, 'points'), num(values, 'F0'), 'points');
  const kind = choice<FitLawKind>(values, 'law');
  try {
    return { data, kind, fit: fitDamperLaw(data.v, data.F, kind) };
  } catch (e) {
    if (e instanceof ComputationError) throw new InputRangeError('points', `${data.v.length} rows`, undefined, '', e.message);
    throw e;
  }
}

/** Half-width of the tolerance band around the fitted force at v, N. */
export function bandHalfWidth(law: DamperLaw, v: number, band: number, floor: number): number {
  return Math.max(band * Math.abs(damperForce(law, v)), floor);
}


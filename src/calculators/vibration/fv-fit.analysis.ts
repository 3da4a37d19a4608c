/** The fv-fit calculator's shared steps (compute and charts): read the sheet, fit, band width. */
import { damperForce, fitDamperLaw, readFvPoints, type DamperLaw, type DamperLawFit, type FitLawKind, type FvData } from '../../core/dampers/index.ts';
import { ComputationError, InputRangeError } from '../../core/errors.ts';
import { choice, num, text, type Values } from '../types.ts';

type Analysis = { data: FvData; kind: FitLawKind; fit: DamperLawFit };

/** The last analysis: charts are drawn from the same values just computed, so the fit runs once. */
let last: { text: string; F0: number; kind: string; analysis: Analysis } | undefined;

/** Parses the sheet and fits the chosen law; a sheet the law cannot describe is named at `points`. */
export function analyseSheet(values: Values): Analysis {
  const sheet = text(values, 'points');
  const F0 = num(values, 'F0');
  const kind = choice<FitLawKind>(values, 'law');
  if (last && last.text === sheet && last.F0 === F0 && last.kind === kind) return last.analysis;
  const data = readFvPoints(sheet, F0, 'points');
  let fit: DamperLawFit;
  try {
    fit = fitDamperLaw(data.v, data.F, kind);
  } catch (e) {
    if (e instanceof ComputationError) throw new InputRangeError('points', `${data.v.length} rows`, undefined, '', e.message);
    throw e;
  }
  const analysis = { data, kind, fit };
  last = { text: sheet, F0, kind, analysis };
  return analysis;
}

/** Half-width of the tolerance band around the fitted force at v, N. */
export function bandHalfWidth(law: DamperLaw, v: number, band: number, floor: number): number {
  return Math.max(band * Math.abs(damperForce(law, v)), floor);
}


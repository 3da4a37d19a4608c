/**
 * The whole storey-dampers calculation from the page's values: the mode (solved or given), the
 * demand at the roof (reduced by the damping correction factor, iterated for α ≠ 1) and the duty
 * of the dampers in every storey. Shared by compute and charts; only calls the core.
 */
import { dampedDemand, storeyDamping, type StoreyDamping } from '../../core/duty/index.ts';
import { InputRangeError } from '../../core/errors.ts';
import { modalFactors, shearBuildingMode, type ModalFactors } from '../../core/vibration/index.ts';
import { lawFromValues } from '../shared/damperLawInputs.ts';
import { choice, num, text, type Values } from '../types.ts';
import { readStoreyRows, type StoreyRow } from './storey-dampers.rows.ts';

export type FrameLayout = 'frame' | 'mode';
export type Demand = 'spectral' | 'roof5' | 'amplitude';

export interface StoreyAnalysis {
  readonly rows: readonly StoreyRow[];
  readonly T: number;
  /** Mode shape at floors 1..N, 1 at the roof. */
  readonly phi: readonly number[];
  readonly modal: ModalFactors;
  /** 5 %-damped roof demand (absent when the amplitude is given). */
  readonly u5: number | undefined;
  readonly roof: number;
  readonly xiTotal: number;
  readonly eta: number | undefined;
  readonly duty: StoreyDamping;
  /** Index of the storey whose damper dissipates most per cycle (the hottest damper). */
  readonly hot: number;
}

function modeOf(values: Values, rows: readonly StoreyRow[], layout: FrameLayout): { T: number; phi: number[] } {
  const m = rows.map((r) => r.m);
  if (layout === 'frame') {
    const mode = shearBuildingMode(m, rows.map((r) => r.second));
    return { T: mode.T, phi: [...mode.phi] };
  }
  const top = rows[rows.length - 1]!.second;
  if (top === 0) throw new InputRangeError('modeRows', 0, undefined, '', 'the mode-shape value of the top storey (last row) must not be 0: the shape is scaled to 1 at the roof');
  return { T: num(values, 'T'), phi: rows.map((r) => r.second / top) };
}

export function analyseStoreys(values: Values): StoreyAnalysis {
  const layout = choice<FrameLayout>(values, 'frame');
  const key = layout === 'frame' ? 'storeys' : 'modeRows';
  const rows = readStoreyRows(text(values, key), key, layout);
  const { T, phi } = modeOf(values, rows, layout);
  const m = rows.map((r) => r.m);
  const modal = modalFactors(m, phi);
  const law = lawFromValues(values);
  const storeys = rows.map((r) => ({ n: r.n, theta: r.theta }));
  const at = (roof: number) => storeyDamping({ law, T, m, phi, storeys, roof });
  const xi0 = num(values, 'xi0');
  const demand = choice<Demand>(values, 'demand');
  let u5: number | undefined;
  let roof: number;
  let xiTotal: number;
  let eta: number | undefined;
  if (demand === 'amplitude') {
    roof = num(values, 'roofAmp');
    xiTotal = xi0 + at(roof).xiD;
  } else {
    if (demand === 'spectral' && !(modal.gamma > 0)) throw new InputRangeError(key, modal.gamma, undefined, '', 'the participation factor of this mode shape is not positive: check the signs of the mode-shape values');
    u5 = demand === 'spectral' ? modal.gamma * num(values, 'Sd') : num(values, 'roof5');
    ({ roof, xiTotal, eta } = dampedDemand(u5, xi0, (u) => at(u).xiD));
  }
  const duty = at(roof);
  let hot = -1;
  duty.storeys.forEach((s, j) => { if (rows[j]!.n > 0 && (hot < 0 || s.W > duty.storeys[hot]!.W)) hot = j; });
  return { rows, T, phi, modal, u5, roof, xiTotal, eta, duty, hot };
}

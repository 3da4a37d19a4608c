import { ComputationError, InputRangeError, POSITIVE, requireInRange } from '../errors.ts';
import { fadeLogSlope, type FadeModel } from './fadeCoefficient.ts';
import { DENSITY_T_REF } from './oilDensity.ts';
import type { ViscosityCurve } from './viscosityCurve.ts';

/** Rows closer than this in temperature count as one test temperature (K). */
export const FADE_FIT_T_GROUP = 1;

export interface FadeFitOptions {
  readonly oil: ViscosityCurve;
  readonly Tref: number; // K
  /** Expansion coefficient for the physical law, 1/K; 0 (default) fits the share law. */
  readonly beta?: number;
}

export interface FadeFit {
  readonly cRef: number; // N·s/m at Tref
  readonly share: number; // viscous (laminar) share at Tref
  /** 1 − SS_res/SS_tot over the forces (SS_tot about the mean force). */
  readonly r2: number;
  readonly rmsError: number; // N
  /** d ln c/dT at Tref, 1/K. */
  readonly dcdT: number;
  /** Each test temperature: mean T (K), c = Σv·F/Σv² of its rows (N·s/m), number of rows. */
  readonly temperatures: readonly { readonly T: number; readonly c: number; readonly n: number }[];
  /** The fitted model (share not clipped to [0, 1]). */
  readonly model: FadeModel;
}

/**
 * Calibrates the fade law from dyno rows (T, v, F) of a linear damper at two or more temperatures.
 * With r = ρ(T)/ρ(T_ref) (1 for the share law) and n = ν(T)/ν(T_ref), each row's force is linear in
 * the two unknowns p = c_ref(1 − s) and q = c_ref·s:
 *
 * $$F_j = p\,r_j v_j + q\,r_j n_j v_j,\qquad \min_{p,q}\sum_j (F_j - p\,r_jv_j - q\,r_jn_jv_j)^2$$
 *
 * solved in closed form (two-column least squares by modified Gram–Schmidt, better conditioned
 * than the normal equations); c_ref = p + q, s = q/(p + q). This equals fitting c(T_i) = Σv·F/Σv²
 * per temperature and then the law to those c_i weighted by Σv² (the residual splits that way).
 *
 * @param rows [T (K), v (m/s), F (N)] in SI
 * @param o the fluid's ν(T), T_ref (K), β (1/K; 0 for the share law)
 * @returns c_ref, s, r², rms error, d ln c/dT at T_ref, the per-temperature coefficients
 * @throws InputRangeError for fewer than two test temperatures; ComputationError when the rows
 *   cannot separate the two parts or give c_ref ≤ 0
 * @example fadeFit([[253.15, 0.2, 400], [293.15, 0.2, 220], [353.15, 0.2, 180]], { oil: andradeCurve(253.15, 1e-3, 353.15, 1e-5), Tref: 293.15 }).cRef // 1050.38 N·s/m
 * @source lawson1974 ch. 19 (modified Gram–Schmidt least squares, from memory); the law: dixon2007thermal (from memory)
 */
export function fadeFit(rows: readonly (readonly number[])[], o: FadeFitOptions): FadeFit {
  const Tref = requireInRange('Tref', o.Tref, POSITIVE, 'K');
  const beta = requireInRange('beta', o.beta ?? 0, { min: 0, max: 0.01, maxExclusive: true }, '1/K');
  const nuRef = o.oil.nu(Tref);
  const x1: number[] = [], x2: number[] = [], F: number[] = [];
  for (const [T, v, f] of rows) {
    requireInRange('T', T!, POSITIVE, 'K');
    const r = (1 + beta * (Tref - DENSITY_T_REF)) / (1 + beta * (T! - DENSITY_T_REF));
    x1.push(r * v!); x2.push(r * (o.oil.nu(T!) / nuRef) * v!); F.push(f!);
  }
  const temperatures = groupTemperatures(rows);
  if (temperatures.length < 2) {
    throw new InputRangeError('rows', `${temperatures.length} temperature${temperatures.length === 1 ? '' : 's'}`, undefined, '', `rows at two or more temperatures (at least ${FADE_FIT_T_GROUP} K apart) are needed to separate the viscous part`);
  }
  const dot = (a: number[], b: number[]) => a.reduce((s, ai, i) => s + ai * b[i]!, 0);
  const n1 = Math.sqrt(dot(x1, x1));
  if (!(n1 > 0)) throw new ComputationError('every row has zero velocity: nothing to fit');
  const q1 = x1.map((x) => x / n1);
  const k12 = dot(q1, x2);
  const u2 = x2.map((x, i) => x - k12 * q1[i]!);
  const n2 = Math.sqrt(dot(u2, u2));
  if (!(n2 > 1e-9 * Math.sqrt(dot(x2, x2)))) throw new ComputationError('the rows cannot tell the viscous part from the rest (the viscosity hardly changes between the test temperatures)');
  const q2 = u2.map((x) => x / n2);
  const g1 = dot(q1, F), g2 = dot(q2, F);
  const q = g2 / n2;
  const p = (g1 - k12 * q) / n1;
  const cRef = p + q;
  if (!(cRef > 0)) throw new ComputationError(`the fitted coefficient at the reference temperature is ${cRef.toPrecision(4)} N·s/m, not positive: check the signs and units of the rows`);
  const share = q / cRef;
  const res = F.map((f, i) => f - p * x1[i]! - q * x2[i]!);
  const ssRes = dot(res, res);
  const mean = F.reduce((s, f) => s + f, 0) / F.length;
  const ssTot = F.reduce((s, f) => s + (f - mean) ** 2, 0);
  const model: FadeModel = { cRef, Tref, viscousShare: share, oil: o.oil, beta };
  return {
    cRef, share, model, temperatures,
    r2: ssTot > 0 ? 1 - ssRes / ssTot : 1,
    rmsError: Math.sqrt(ssRes / F.length),
    dcdT: fadeLogSlope(model, Tref),
  };
}

/** Groups rows by temperature (sorted; a new group when T is more than FADE_FIT_T_GROUP above the group's first row). */
function groupTemperatures(rows: readonly (readonly number[])[]): { T: number; c: number; n: number }[] {
  const sorted = [...rows].sort((a, b) => a[0]! - b[0]!);
  const out: { T: number; c: number; n: number }[] = [];
  let start = 0;
  for (let i = 1; i <= sorted.length; i++) {
    if (i < sorted.length && sorted[i]![0]! - sorted[start]![0]! <= FADE_FIT_T_GROUP) continue;
    const g = sorted.slice(start, i);
    const vv = g.reduce((s, r) => s + r[1]! ** 2, 0);
    const vF = g.reduce((s, r) => s + r[1]! * r[2]!, 0);
    if (vv > 0) out.push({ T: g.reduce((s, r) => s + r[0]!, 0) / g.length, c: vF / vv, n: g.length });
    start = i;
  }
  return out;
}

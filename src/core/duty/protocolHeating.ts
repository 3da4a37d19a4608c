/**
 * Temperature of a damper through a cyclic test protocol (blocks of sinusoidal cycles with rests),
 * with the energy of every cycle recomputed at the damper's temperature: the check that a long
 * prototype test (for example thousands of cycles at wind amplitude) does not fail on heat alone.
 */
import { energyPerCycle, type DamperLaw } from '../dampers/index.ts';
import { ComputationError, InputRangeError, NON_NEGATIVE, POSITIVE, requireInRange } from '../errors.ts';
import { lumpedStep } from '../thermal/lumpedStep.ts';
import { ZERO_CELSIUS } from '../constants.ts';

export interface ProtocolBlock {
  /** Number of cycles (whole, ≥ 1); stroke amplitude X, m; frequency f, Hz; rest after the block, s. */
  readonly N: number;
  readonly X: number;
  readonly f: number;
  readonly rest: number;
}

export interface ProtocolBody {
  /** Heat capacity Σ m·c, J/K, > 0; conductance to ambient, W/K, ≥ 0 (0: adiabatic); ambient and start temperature, K. */
  readonly Cth: number;
  readonly UA: number;
  readonly Tamb: number;
}

export interface ProtocolRun {
  readonly Efirst: number;
  readonly Elast: number;
  /** Total energy dissipated, J. */
  readonly energy: number;
  readonly Tpeak: number;
  readonly Tend: number;
  /** Largest |r(T)/r(T_amb) − 1| of any cycle: the change of energy per cycle that heating alone causes. */
  readonly maxChange: number;
  readonly cycles: number;
  /** Length of the protocol with its rests, s. */
  readonly duration: number;
  /** Thinned trace (at most about 600 points): time s, temperature K, energy of the cycle J (NaN-free). */
  readonly trace: { readonly t: number[]; readonly T: number[]; readonly E: number[] };
}

/** Most cycles a protocol may hold (about 0.1 s of computing). */
export const MAX_PROTOCOL_CYCLES = 1_000_000;
/** Temperature the integration refuses to pass: beyond any damper fluid and the handbook's temperature inputs. */
export const PROTOCOL_T_MAX = ZERO_CELSIUS + 400;

function checkBlocks(blocks: readonly ProtocolBlock[]): number {
  if (blocks.length === 0) throw new InputRangeError('protocol', 'no rows', undefined, '', 'give at least one row N, X, f, rest');
  let total = 0;
  blocks.forEach((b, i) => {
    const row = `row ${i + 1}`;
    if (!Number.isInteger(b.N) || b.N < 1) throw new InputRangeError('protocol', b.N, { min: 1, max: MAX_PROTOCOL_CYCLES }, '', `${row}: N must be a whole number of cycles`);
    requireInRange('protocol', b.X, { min: 0, max: 10, minExclusive: true }, 'm');
    requireInRange('protocol', b.f, { min: 1e-4, max: 1000 }, 'Hz');
    requireInRange('protocol', b.rest, { min: 0, max: 1e7 }, 's');
    total += b.N;
  });
  if (total > MAX_PROTOCOL_CYCLES) throw new InputRangeError('protocol', total, { min: 1, max: MAX_PROTOCOL_CYCLES }, 'cycles', 'the protocol holds too many cycles');
  return total;
}

/**
 * Lumped body through the protocol, one cycle at a time. Cycle k of a block dissipates
 * E_k = E_law(X, ω)·r(T_k), r the temperature law c(T)/c_law (1 without one), evaluated at the
 * cycle's mid temperature (predictor–corrector, second order in the cycle's rise); within the cycle
 * the power E_k·f is taken as steady and the body step is exact:
 *
 * $$\theta_{k+1} = \theta_k + \Big(\frac{E_k f}{UA} - \theta_k\Big)\big(1 - e^{-\Delta t/\tau}\big),\quad \tau = \frac{C}{UA},\ \Delta t = \frac1f
 *   \qquad (UA = 0:\ \theta_{k+1} = \theta_k + E_k/C)$$
 *
 * and a rest cools it by θ·e^{−t_rest/τ}.
 *
 * @param blocks protocol rows (N ≥ 1 whole, X (0, 10] m, f [10⁻⁴, 1000] Hz, rest [0, 10⁷] s)
 * @param law damper law at the temperature law's reference temperature (at any temperature without one)
 * @param body Cth (0, ∞) J/K, UA [0, ∞) W/K, Tamb (0, 673.15) K
 * @param ratio optional temperature law r(T) = c(T)/c_law, > 0; the body starts at T_amb
 * @throws InputRangeError naming the input and row; ComputationError above 400 °C or when r(T) has no value
 * @example protocolHeating([{ N: 2000, X: 0.01, f: 0.25, rest: 0 }], { kind: 'linear', c: 1e6 }, { Cth: 122e3, UA: 0, Tamb: 293.15 }) // { Efirst: 493.48, Tpeak: 301.2398, energy: 986960 }
 * @source chopra2017 eq. 3.8.1 (E = πcωX²); incropera2007 §5.3, eq. 5.6 (lumped capacitance, from memory); asce7_16 §18.6.2 (wind prototype cycles, from memory)
 */
export function protocolHeating(blocks: readonly ProtocolBlock[], law: DamperLaw, body: ProtocolBody, ratio?: (T: number) => number): ProtocolRun {
  const total = checkBlocks(blocks);
  requireInRange('Cth', body.Cth, POSITIVE, 'J/K');
  requireInRange('UA', body.UA, NON_NEGATIVE, 'W/K');
  requireInRange('Tamb', body.Tamb, { min: 0, max: PROTOCOL_T_MAX, minExclusive: true, maxExclusive: true }, 'K');
  const { Cth, UA, Tamb } = body;
  const tau = UA > 0 ? Cth / UA : Infinity;
  const r = (theta: number): number => {
    if (!ratio) return 1;
    const v = ratio(Tamb + theta);
    if (!(v > 0) || !Number.isFinite(v)) throw new ComputationError(`the temperature law gives no damping coefficient at ${(Tamb + theta).toFixed(1)} K`);
    return v;
  };
  const heat = (theta: number, E: number, f: number): number => (UA > 0 ? lumpedStep(theta, E * f, 1 / f, tau, UA) : theta + E / Cth);
  const r0 = r(0);
  const stride = Math.max(1, Math.ceil(total / 500));
  const trace = { t: [0], T: [Tamb], E: [] as number[] };
  let theta = 0, t = 0, peak = 0, energy = 0, maxChange = 0, Efirst = NaN, Elast = NaN, n = 0;
  for (const [bi, b] of blocks.entries()) {
    const Eref = energyPerCycle(law, b.X, 2 * Math.PI * b.f);
    for (let k = 0; k < b.N; k++) {
      const guess = heat(theta, Eref * r(theta), b.f);
      const rk = r(0.5 * (theta + guess));
      const E = Eref * rk;
      theta = heat(theta, E, b.f);
      t += 1 / b.f;
      energy += E;
      n++;
      maxChange = Math.max(maxChange, Math.abs(rk / r0 - 1));
      if (n === 1) { Efirst = E; trace.E.push(E); }
      Elast = E;
      if (!(Tamb + theta < PROTOCOL_T_MAX)) throw new ComputationError(`the damper passes 400 °C in cycle ${k + 1} of row ${bi + 1}: shorten the protocol or add rests`);
      peak = Math.max(peak, theta);
      if (n % stride === 0 || k === b.N - 1) { trace.t.push(t); trace.T.push(Tamb + theta); trace.E.push(E); }
    }
    if (b.rest > 0) {
      theta = UA > 0 ? theta * Math.exp(-b.rest / tau) : theta;
      t += b.rest;
      trace.t.push(t); trace.T.push(Tamb + theta); trace.E.push(Elast);
    }
  }
  return { Efirst, Elast, energy, Tpeak: Tamb + peak, Tend: Tamb + theta, maxChange, cycles: n, duration: t, trace };
}

/**
 * The warm-up page's two-node run (oil and body): exact segment by segment for a constant UA
 * (`twoNodeLinear`), or integrated (`twoNodeWarmUp`) when the body model sheds Q(T_b). The body
 * node holds the total heat capacity less the oil's.
 */
import { InputRangeError } from '../../core/errors.ts';
import { bodyHeatLoss, twoNodeLinear, twoNodeWarmUp, type Body, type PowerProfile, type ProfileEnd } from '../../core/thermal/index.ts';
import { num, type Values } from '../types.ts';

export interface TwoNodeSetup {
  readonly C: number;
  readonly Tamb: number;
  readonly profile: PowerProfile;
  readonly end: ProfileEnd;
}

export interface TwoNodeResult {
  readonly oilAtT: number;
  readonly bodyAtT: number;
  readonly tLimitOil: number | undefined;
  readonly oilPeak: number;
  /** (put in − stored − shed)/put in over the run. */
  readonly closure: number;
  /** Samples for the chart up to tChart. */
  readonly t: readonly number[];
  readonly oil: readonly number[];
  readonly body: readonly number[];
}

/** Runs the two nodes to tEnd; `body` is the body model's body, or undefined for constant UA. */
export function warmUpTwoNode(values: Values, m: TwoNodeSetup, body: Body | undefined, tEnd: number, tq: number, Tlimit: number, tChart: number): TwoNodeResult {
  const Coil = num(values, 'Coil');
  if (!(Coil < m.C)) throw new InputRangeError('Coil', Coil, { min: 0, max: m.C, minExclusive: true, maxExclusive: true }, 'J/K');
  const nodes = { Coil, Cbody: m.C - Coil, Gob: num(values, 'Gob'), T0: m.Tamb };
  const end = Math.max(tEnd, tq, tChart);
  // relative to what was put in, or to 1 J when almost nothing was (a ratio of round-off otherwise)
  const audit = (r: { energyIn: number; energyLost: number; energyStored: number }) => (r.energyIn - r.energyStored - r.energyLost) / Math.max(r.energyIn, 1);
  if (!body) {
    const r = twoNodeLinear(nodes, num(values, 'UA'), m.profile, m.end, end);
    const at = r.at(tq);
    const t = tChart > 0 ? Array.from({ length: 401 }, (_, i) => (tChart * i) / 400) : [];
    const s = t.map((x) => r.at(x));
    return { oilAtT: at.oil, bodyAtT: at.body, tLimitOil: r.tCross(Tlimit), oilPeak: r.oilPeak, closure: audit(r), t, oil: s.map((x) => x.oil), body: s.map((x) => x.body) };
  }
  const Q = bodyHeatLoss(body);
  const run = (stop: number, stopAt?: number) => twoNodeWarmUp(Q, nodes, m.profile, m.end, stop, { stopAt });
  const r = run(end);
  const atT = tq > 0 ? run(tq) : { oil: [m.Tamb], body: [m.Tamb] };
  const cross = r.oil.findIndex((x) => x >= Tlimit);
  const keep = r.t.map((x, i) => (x <= tChart ? i : -1)).filter((i) => i >= 0);
  return {
    oilAtT: atT.oil.at(-1)!, bodyAtT: atT.body.at(-1)!,
    // the event, located to round-off; an oil that starts at the limit is there at t = 0
    tLimitOil: cross < 0 ? undefined : cross === 0 ? 0 : run(r.t[cross]!, Tlimit).tCross,
    oilPeak: r.oilPeak, closure: audit(r),
    t: keep.map((i) => r.t[i]!), oil: keep.map((i) => r.oil[i]!), body: keep.map((i) => r.body[i]!),
  };
}

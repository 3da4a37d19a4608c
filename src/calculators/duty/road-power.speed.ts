/**
 * Mean damper power against speed for every ISO 8608 class, on enough speeds (60, log-spaced)
 * that the lines look straight on log–log axes, at a cost of a handful of full evaluations.
 *
 * Why it is cheap: the road's temporal displacement PSD is G_z(f) = G_d(n0)·n0^w·V^(w−1)·f^(−w)
 * (ISO 8608 §5 with n = f/V, from memory), and the quarter car's integration band does not depend on
 * V, so class and speed enter only through s = G_d(n0)·V^(w−1). Hence
 * - w = 2: the closed form is exact and cheap for every law, evaluated at every point;
 * - linear damper: P is proportional to s, so one evaluation scales to every class and speed;
 * - power-law damper: P = F(s); F is evaluated at 5 points per decade of s and interpolated
 *   linearly in log–log between them (F is smooth and near a power law; the interpolation error is
 *   checked against direct evaluation in test/calculators/road-power.speed.test.ts).
 */
import { damperVelocityVariance, ISO_8608_CLASSES, roadDamperPower, roadRoughness, linearisationStart, statisticalLinearisation, type RoadDamper } from '../../core/duty/index.ts';

type Car = Parameters<typeof roadDamperPower>[0];

export interface PowerSpeedCurves {
  readonly speeds: readonly number[];
  /** Per class A…H, the mean power at each speed, W. */
  readonly classes: readonly { readonly cls: string; readonly power: readonly number[] }[];
}

const logGrid = (a: number, b: number, n: number) => Array.from({ length: n }, (_, i) => a * (b / a) ** (i / (n - 1)));

/** F(s): mean power on a road of scale s = G_d(n0)·V^(w−1) (evaluated at V = 1 m/s, where G_d(n0) = s). */
function atScale(car: Car, w: number, damper: RoadDamper, s: number): number {
  return roadDamperPower(car, { Gd0: s, w, V: 1 }, damper, 1e-4, 24);
}

/** Interpolates F linearly in log–log on a grid of at least 5 points per decade covering [sLo, sHi]. */
function tabulated(car: Car, w: number, damper: RoadDamper, sLo: number, sHi: number): (s: number) => number {
  const n = Math.max(2, Math.ceil(5 * Math.log10(sHi / sLo)) + 1);
  const ls = logGrid(sLo, sHi, n).map(Math.log);
  let lp: number[];
  if (damper.kind === 'power') {
    // roadDamperPower's linearisation, each point started from its neighbour's equivalent damping
    // (a few secant steps instead of a dozen from the generic start)
    let c0 = linearisationStart(damper.C, damper.alpha);
    lp = ls.map((l) => {
      const road = { Gd0: Math.exp(l), w, V: 1 };
      const lin = statisticalLinearisation(damper.C, damper.alpha, (c) => Math.sqrt(damperVelocityVariance({ ...car, c }, road, 1e-4, 24)), c0, 1e-4);
      c0 = lin.ceq;
      return Math.log(lin.ceq * lin.sigmaV ** 2);
    });
  } else lp = ls.map((l) => Math.log(atScale(car, w, damper, Math.exp(l))));
  return (s) => {
    const l = Math.log(s);
    if (n === 2 || !(sHi > sLo)) return Math.exp(lp[0]! + ((l - ls[0]!) / ((ls[1]! - ls[0]!) || 1)) * (lp[1]! - lp[0]!));
    const i = Math.min(n - 2, Math.max(0, Math.floor(((l - ls[0]!) / (ls[n - 1]! - ls[0]!)) * (n - 1))));
    const t = (l - ls[i]!) / (ls[i + 1]! - ls[i]!);
    return Math.exp(lp[i]! + t * (lp[i + 1]! - lp[i]!));
  };
}

/** Power against speed for classes A…H (geometric means) from vLo to vHi. */
export function powerAgainstSpeed(car: Car, w: number, damper: RoadDamper, vLo: number, vHi: number, points = 60): PowerSpeedCurves {
  const speeds = logGrid(vLo, vHi, points);
  const gd = ISO_8608_CLASSES.map((cls) => ({ cls, Gd0: roadRoughness(cls, 'mean').Gd0 }));
  const scale = (Gd0: number, V: number) => Gd0 * V ** (w - 1);
  let F: (s: number) => number;
  if (w === 2) F = (s) => atScale(car, w, damper, s); // closed form inside roadDamperPower
  else if (damper.kind === 'linear') { const p1 = atScale(car, w, damper, 1); F = (s) => p1 * s; }
  else {
    const all = gd.flatMap((g) => [scale(g.Gd0, vLo), scale(g.Gd0, vHi)]);
    F = tabulated(car, w, damper, all.reduce((a, b) => Math.min(a, b), Infinity), all.reduce((a, b) => Math.max(a, b), -Infinity));
  }
  return { speeds, classes: gd.map((g) => ({ cls: g.cls, power: speeds.map((V) => F(scale(g.Gd0, V))) })) };
}

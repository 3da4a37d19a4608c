/**
 * The warm-up page's hand-off to the thermal-life page: the body temperature over the time of
 * interest from a cold start, then the cool-down with the power off, as "t, T" rows (seconds,
 * kelvin). Thermal-life repeats it: one shift of the duty, then the next.
 */
import { formatTemperatureHistory } from '../../core/ageing/index.ts';
import type { PowerProfile, ProfileEnd } from '../../core/thermal/index.ts';

/** Longest hand-off text, characters (the thermal-life field's maxLength is larger). */
export const HISTORY_HANDOFF_MAX = 8000;
/** Rows in the run (switching times and the points between them), and in the cool-down. */
const RUN_POINTS = 260;
const COOL_POINTS = 60;
/** More switching times than this in the run: sample it evenly instead (the cycles are then short against τ, their ripple small). */
const MAX_SWITCHES = 150;

export interface WarmUpRun {
  /** Temperature at time t of the duty, K (exact closed form of the page's constant-UA model). */
  readonly at: (t: number) => number;
  readonly profile: PowerProfile;
  readonly end: ProfileEnd;
  readonly tau: number;
  readonly Tamb: number;
}

/**
 * Rows of the run from 0 to t_end (the time of interest, at least one run of a once-only profile),
 * with every switching time in it when there are few, then the cool-down from the last value over
 * 3τ (at most ten times the run: a body with a very long τ barely cools in a shift).
 */
export function warmUpHistory(m: WarmUpRun, tOfInterest: number): string {
  const period = m.profile.t[m.profile.t.length - 1]!;
  const tEnd = Math.max(m.end === 'off' ? period : 0, tOfInterest, 1);
  const switches: number[] = [];
  for (let k = 0; k * period < tEnd && switches.length <= MAX_SWITCHES; k++) {
    for (const s of m.profile.t.slice(0, -1)) if (k * period + s < tEnd) switches.push(k * period + s);
  }
  const times: number[] = [];
  if (switches.length <= MAX_SWITCHES) {
    const knots = [...switches, tEnd];
    const per = Math.max(1, Math.floor(RUN_POINTS / (knots.length - 1 || 1)));
    for (let i = 0; i + 1 < knots.length; i++) for (let j = 0; j < per; j++) times.push(knots[i]! + ((knots[i + 1]! - knots[i]!) * j) / per);
    times.push(tEnd);
  } else {
    for (let i = 0; i <= RUN_POINTS; i++) times.push((tEnd * i) / RUN_POINTS);
  }
  const T = times.map((t) => m.at(t));
  const Tlast = T[T.length - 1]!;
  const cool = Math.min(3 * m.tau, 10 * tEnd);
  for (let i = 1; i <= COOL_POINTS; i++) {
    // denser where the body is hot and cools fastest: the ageing rate changes most there
    const s = cool * (i / COOL_POINTS) ** 2;
    times.push(tEnd + s);
    T.push(m.Tamb + (Tlast - m.Tamb) * Math.exp(-s / m.tau));
  }
  // a model far past any damper (UA typed near zero) can leave the float range: hand over a comment, which the target refuses at its field
  if (!T.every(Number.isFinite)) return '# the warm-up model has no finite temperature history: check UA';
  return formatTemperatureHistory({ t: times, T });
}

/**
 * Refines one extreme of one output by a pattern search (Hooke and Jeeves) in the unit cube of the
 * varied inputs: explore a step up and down each input keeping what improves, then jump again in
 * the direction that just paid (the pattern move), so the search follows a diagonal ridge (the
 * resonance peak moving with the mass) instead of zig-zagging; halve the step when nothing
 * improves. Corners and samples alone can step over the top of a peak; this climbs the last part.
 * Bounded by an evaluation budget. Source: R. Hooke, T. A. Jeeves, "Direct search solution of
 * numerical and statistical problems", J. ACM 8 (1961) 212–229 (from memory).
 */

/** Evaluates the output at a point of the unit cube; undefined where it has no value (a failing point). */
export type PointValue = (u: readonly number[]) => number | undefined;

/** Smallest step (a fraction of each input's range) the search takes before it stops. */
const MIN_STEP = 1e-7;
const FIRST_STEP = 1 / 32;

/** Evaluations one refinement may spend: a fixed part plus a part per varied input. */
export function refineBudget(k: number): number {
  return 60 + 60 * k;
}

const clamp01 = (x: number) => (x < 0 ? 0 : x > 1 ? 1 : x);

/**
 * Climbs from `start` (value `f0`) towards larger `sense·value` (sense +1 for a maximum, −1 for a
 * minimum). Returns the best point, its value and the evaluations spent. `firstStep` lets a probe
 * from a corner start small.
 */
export function patternSearch(value: PointValue, start: readonly number[], f0: number, sense: 1 | -1, budget: number, firstStep = FIRST_STEP): { u: number[]; value: number; spent: number } {
  let spent = 0;
  const score = (u: readonly number[]): number => {
    spent++;
    const v = value(u);
    return v === undefined ? -Infinity : sense * v;
  };
  /** One exploratory pass: each input a step up, else a step down, keeping any improvement. */
  const explore = (from: readonly number[], f: number, step: number): { u: number[]; f: number } => {
    const u = [...from];
    for (let j = 0; j < u.length && spent < budget; j++) {
      for (const dir of [1, -1]) {
        const x = clamp01(u[j]! + dir * step);
        if (x === u[j]) continue;
        const old = u[j]!;
        u[j] = x;
        const g = score(u);
        if (g > f) { f = g; break; }
        u[j] = old;
        if (spent >= budget) break;
      }
    }
    return { u, f };
  };
  let base = [...start];
  let fb = sense * f0;
  let step = firstStep;
  while (step >= MIN_STEP && spent < budget) {
    let next = explore(base, fb, step);
    if (!(next.f > fb)) { step /= 2; continue; }
    // pattern moves: keep jumping by the last improvement while it pays
    while (spent < budget) {
      const prev = base;
      base = next.u;
      fb = next.f;
      const jump = base.map((x, j) => clamp01(2 * x - prev[j]!));
      if (jump.every((x, j) => x === base[j])) break;
      const tried = explore(jump, score(jump), step);
      if (!(tried.f > fb)) break;
      next = tried;
    }
  }
  return { u: base, value: sense * fb, spent };
}

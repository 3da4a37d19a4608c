/**
 * Test helper: the linear SDOF m ẍ + c ẋ + k x = F₀ sin ωt as an ODE system, and its closed-form
 * solution (steady state plus the free response of the remaining initial conditions), built from
 * the project's closed-form free response.
 * Source: Rao, Mechanical Vibrations, 6th ed., §3.4–3.6 (steady state M, φ; from memory) and
 * §2.6 (free response).
 */
import { freeResponse } from '../../../src/core/vibration/index.ts';
import type { OdeSystem } from '../../../src/core/ode/index.ts';

export interface Linear { m: number; k: number; c: number; F0: number; w: number; x0: number; v0: number }

export function linearSystem(p: Linear): OdeSystem {
  return {
    dim: 2,
    f(t, y, dy) {
      dy[0] = y[1]!;
      dy[1] = (p.F0 * Math.sin(p.w * t) - p.c * y[1]! - p.k * y[0]!) / p.m;
    },
  };
}

export function linearExact(p: Linear): (t: number) => { x: number; v: number } {
  // steady state x_p = X sin(ωt − φ), X = F0 / sqrt((k − mω²)² + (cω)²)
  const re = p.k - p.m * p.w * p.w;
  const im = p.c * p.w;
  const X = p.F0 / Math.hypot(re, im);
  const phi = Math.atan2(im, re);
  const xp = (t: number) => X * Math.sin(p.w * t - phi);
  const vp = (t: number) => X * p.w * Math.cos(p.w * t - phi);
  const hom = freeResponse({ m: p.m, k: p.k, c: p.c, x0: p.x0 - xp(0), v0: p.v0 - vp(0) });
  return (t) => {
    const h = hom(t);
    return { x: h.x + xp(t), v: h.v + vp(t) };
  };
}

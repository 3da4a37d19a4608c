import type { EmbeddedTableau } from './tableau.ts';

/**
 * Dormand–Prince 5(4) "DOPRI5": 7 stages, FSAL, fifth-order propagated solution with a
 * fourth-order embedded estimate (local extrapolation).
 *
 * $$y_{n+1} = y_n + h\sum_{i=1}^{7} b_i k_i,\qquad
 *   \widehat{\mathrm{err}} = h\sum_{i=1}^{7}(b_i - \hat b_i)k_i,\qquad
 *   k_i = f\!\left(t_n + c_i h,\; y_n + h\sum_{j<i} a_{ij}k_j\right)$$
 *
 * Coefficients as printed in Dormand & Prince (1980), Table 2, and Hairer, Nørsett & Wanner,
 * Solving ODEs I, 2nd ed., Table II.5.2 (coefficients written from memory; the order conditions
 * up to order 5 are checked by test/core/ode/tableau.test.ts, which would catch a wrong digit).
 * Dense-output coefficients d_i: Hairer, Nørsett & Wanner §II.6, eq. (6.12) with the continuous
 * extension of Shampine (1986) (from memory; checked in the tests by the order of the
 * interpolation error).
 *
 * @source dormand1980 Table 2; hairer1993 Table II.5.2 (from memory)
 */
export const DORMAND_PRINCE_54: EmbeddedTableau = {
  name: 'Dormand–Prince 5(4)',
  c: [0, 1 / 5, 3 / 10, 4 / 5, 8 / 9, 1, 1],
  a: [
    [],
    [1 / 5],
    [3 / 40, 9 / 40],
    [44 / 45, -56 / 15, 32 / 9],
    [19372 / 6561, -25360 / 2187, 64448 / 6561, -212 / 729],
    [9017 / 3168, -355 / 33, 46732 / 5247, 49 / 176, -5103 / 18656],
    [35 / 384, 0, 500 / 1113, 125 / 192, -2187 / 6784, 11 / 84],
  ],
  b: [35 / 384, 0, 500 / 1113, 125 / 192, -2187 / 6784, 11 / 84, 0],
  bHat: [5179 / 57600, 0, 7571 / 16695, 393 / 640, -92097 / 339200, 187 / 2100, 1 / 40],
  order: 5,
  embeddedOrder: 4,
  fsal: true,
  dense: [
    -12715105075 / 11282082432, 0, 87487479700 / 32700410799, -10690763975 / 1880347072,
    701980252875 / 199316789632, -1453857185 / 822651844, 69997945 / 29380423,
  ],
};

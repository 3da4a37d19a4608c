/**
 * An explicit embedded Runge–Kutta method as data (Butcher tableau). The integrator reads the
 * coefficients from here, so a method is changed by swapping data, and the order conditions of
 * the data can be tested on their own.
 */
export interface EmbeddedTableau {
  /** Short name shown in reports. */
  readonly name: string;
  /** Nodes c_i (length s). */
  readonly c: readonly number[];
  /** Strictly lower-triangular coefficients a_ij, row i has i entries (row 0 empty). */
  readonly a: readonly (readonly number[])[];
  /** Weights of the propagated solution (order `order`). */
  readonly b: readonly number[];
  /** Weights of the embedded solution (order `embeddedOrder`), used only for the error estimate. */
  readonly bHat: readonly number[];
  readonly order: number;
  readonly embeddedOrder: number;
  /**
   * First same as last: the last stage is evaluated at the new solution, so its derivative is
   * the first stage of the next step (one evaluation saved per step).
   */
  readonly fsal: boolean;
  /**
   * Optional continuous extension: coefficients d_i of the fifth dense-output polynomial term
   * (Hairer–Nørsett–Wanner form, see denseOutput.ts). Length s.
   */
  readonly dense?: readonly number[];
}

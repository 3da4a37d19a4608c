/**
 * What a duty calculation hands to the thermal pages: the mean power the damper turns into
 * heat and, where there is one, its time profile.
 */
export interface DutySummary {
  /** Mean power over the duty, W (≥ 0). */
  readonly meanPower: number;
  /**
   * Power against time as equal blocks (blockPower: energy kept on any sampling): P[k], W, holds
   * from t[k] to t[k+1], s; t has one entry more than P.
   */
  readonly profile?: { readonly t: number[]; readonly P: number[] };
}

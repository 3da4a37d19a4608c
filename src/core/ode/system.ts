/**
 * A first-order system y' = f(t, y) as the integrators see it. The right-hand side writes into a
 * preallocated array, so a long simulation allocates nothing per step.
 */
export interface OdeSystem {
  /** Number of state components. */
  readonly dim: number;
  /** Writes f(t, y) into `dydt`. Must not keep references to `y` or `dydt`. */
  f(t: number, y: Float64Array, dydt: Float64Array): void;
}

/** Work counters reported with every solution. */
export interface OdeStats {
  accepted: number;
  rejected: number;
  evaluations: number;
}

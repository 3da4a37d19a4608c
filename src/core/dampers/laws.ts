/**
 * Damper laws: force as a function of the damper's relative velocity. Sign convention:
 * positive velocity = extension (rebound), negative = compression (bump); the force opposes
 * the motion, so F·v ≥ 0 for every passive law and F(v) is returned with the sign of v.
 */
export type DamperLaw =
  /** F = c·v */
  | { readonly kind: 'linear'; readonly c: number }
  /** F = C·|v|^α·sign(v), 0 < α ≤ 2 (fluid viscous dampers: α ≈ 0.3–1) */
  | { readonly kind: 'power'; readonly C: number; readonly alpha: number }
  /** F = F_f·sign(v) (dry friction, a friction damper's slip force) */
  | { readonly kind: 'coulomb'; readonly Ff: number }
  /**
   * Two slopes split at a knee velocity, separately for rebound and compression:
   * |F| = c1·|v| for |v| ≤ v_k, c1·v_k + c2·(|v| − v_k) above; automotive dampers are tuned so.
   */
  | {
      readonly kind: 'bilinear';
      readonly rebound: { readonly c1: number; readonly c2: number };
      readonly compression: { readonly c1: number; readonly c2: number };
      readonly vknee: number;
    }
  /**
   * Hysteretic (structural) damping with loss factor η on stiffness k: under harmonic motion at
   * ω it acts as a viscous damper c = η·k/ω, which is how it is evaluated here.
   */
  | { readonly kind: 'hysteretic'; readonly eta: number; readonly k: number };

export type DamperLawKind = DamperLaw['kind'];

/**
 * The one range of the power-law velocity exponent α accepted anywhere in the handbook (inputs,
 * core validation, road and structural duty). Fluid viscous dampers are made with α ≈ 0.3–1
 * (common practice, no source); below 0.05 a power law is a friction damper in all but name and the
 * time simulation's regularisation dominates, above 2 no damper is built.
 */
export const ALPHA_RANGE = { min: 0.05, max: 2 } as const;

export const DAMPER_LAW_KINDS: readonly DamperLawKind[] = ['linear', 'power', 'coulomb', 'bilinear', 'hysteretic'];

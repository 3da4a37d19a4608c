/**
 * Upper- and lower-bound damper properties from property modification factors, as the US seismic
 * provisions ask for dampers and isolators: the upper bound sets damper, brace and connection
 * forces, the lower bound the drift and the damping credited.
 */
import { requireInRange } from '../errors.ts';

export interface PropertyFactors {
  /** Aging and environmental factors, λ_ae,max ≥ 1 and λ_ae,min ∈ [0.2, 1]. */
  readonly lamAeMax: number;
  readonly lamAeMin: number;
  /** Test factors (heating, rate, scragging in the prototype tests), max ≥ 1, min ∈ [0.2, 1]. */
  readonly lamTestMax: number;
  readonly lamTestMin: number;
  /** Specification (manufacturing) tolerance, max ≥ 1, min ∈ [0.2, 1]; ±15 % is usual for fluid viscous dampers. */
  readonly lamSpecMax: number;
  readonly lamSpecMin: number;
  /** System property adjustment factor a, [0.5, 1]; 0.75 for all but essential facilities (1.0 there). */
  readonly adjust: number;
}

export interface PropertyBounds {
  readonly lamMax: number;
  readonly lamMin: number;
}

const UPPER = { min: 1, max: 5 };
// a minimum factor below 0.2 describes a damper that has all but failed, not a property bound
const LOWER = { min: 0.2, max: 1 };

/**
 * Maximum and minimum property modification factors.
 *
 * $$\lambda_{max} = \big(1 + a(\lambda_{ae,max} - 1)\big)\,\lambda_{test,max}\,\lambda_{spec,max} \ge 1$$
 * $$\lambda_{min} = \big(1 - a(1 - \lambda_{ae,min})\big)\,\lambda_{test,min}\,\lambda_{spec,min} \le 1$$
 *
 * The adjustment a reduces only the aging and environmental part: all those effects seldom reach
 * their extremes at once.
 *
 * @param p factors: the max factors in [1, 5], the min factors in [0.2, 1], a in [0.5, 1]
 * @throws InputRangeError naming the factor out of range
 * @example propertyBounds({ lamAeMax: 1.1, lamTestMax: 1.05, lamSpecMax: 1.15, lamAeMin: 1, lamTestMin: 0.95, lamSpecMin: 0.85, adjust: 0.75 }) // { lamMax: 1.2981, lamMin: 0.8075 }
 * @source asce7_16 §17.2.8.4, eqs. 17.2-1 and 17.2-2, and §18.2.4.5 (section and equation numbers from memory)
 */
export function propertyBounds(p: PropertyFactors): PropertyBounds {
  for (const k of ['lamAeMax', 'lamTestMax', 'lamSpecMax'] as const) requireInRange(k, p[k], UPPER, '');
  for (const k of ['lamAeMin', 'lamTestMin', 'lamSpecMin'] as const) requireInRange(k, p[k], LOWER, '');
  const a = requireInRange('adjust', p.adjust, { min: 0.5, max: 1 }, '');
  return {
    lamMax: (1 + a * (p.lamAeMax - 1)) * p.lamTestMax * p.lamSpecMax,
    lamMin: (1 - a * (1 - p.lamAeMin)) * p.lamTestMin * p.lamSpecMin,
  };
}

import { AIR_TABLE_RANGE } from '../constants.ts';
import { POSITIVE, requireInRange } from '../errors.ts';
import { airProperties } from './airProperties.ts';
import { CHURCHILL_BERNSTEIN_REPR_MIN, churchillBernstein } from './churchillBernstein.ts';
import { CHURCHILL_CHU_CYLINDER_RA_MAX, churchillChuCylinder } from './churchillChuCylinder.ts';
import { mixedConvection } from './mixedConvection.ts';
import { radiationCoefficient } from './radiationCoefficient.ts';
import { rayleighNumber } from './rayleighNumber.ts';
import { verticalCylinderSlenderness, verticalPlateNusselt } from './verticalPlate.ts';

export type Orientation = 'horizontal' | 'vertical';

/** A cylindrical damper body in air. SI throughout. */
export interface Body {
  readonly D: number; // m, diameter
  readonly L: number; // m, length
  readonly orientation: Orientation;
  /** Include the two flat end faces in the area (at the lateral coefficient). */
  readonly ends: boolean;
  readonly eps: number; // emissivity
  readonly Tamb: number; // K, air far from the body
  readonly Tsur?: number; // K, radiating surroundings (default Tamb)
  readonly V: number; // m/s, air speed across the body (0 = still air)
  /** Conductance of the mounts to air at T∞, W/K (`mountConductance`); default 0. */
  readonly Gmount?: number;
  /** Heat absorbed from the sun or another beam, W (`solarGain`); default 0. */
  readonly Qsun?: number;
}

export interface BodyCooling {
  readonly area: number; // m²
  readonly Tfilm: number; // K
  readonly hNatural: number; // W/(m²·K)
  readonly hForced: number; // W/(m²·K), 0 in still air
  readonly hConv: number; // W/(m²·K), combined
  readonly hRad: number; // W/(m²·K)
  readonly Qconv: number; // W
  readonly Qrad: number; // W
  readonly Qmount: number; // W, conducted into the mounts, Gmount·(Ts − T∞)
  readonly Qsun: number; // W, absorbed from the sun (a gain: it counts against the loss)
  readonly Q: number; // W, net heat leaving the body, Qconv + Qrad + Qmount − Qsun
  readonly UA: number; // W/K, (hConv + hRad)·area + Gmount
  readonly Ra: number; // on D (horizontal) or L (vertical)
  readonly Re: number; // on D
  readonly Pr: number;
  readonly warnings: readonly string[];
}

/** Temperatures the air table supports for body and air (film temperature stays inside it). */
export const BODY_T_RANGE = AIR_TABLE_RANGE;

/**
 * Heat leaving a cylindrical body at surface temperature Ts by convection and radiation.
 *
 * $$Q = h_{conv}A(T_s-T_\infty) + h_r A(T_s-T_{sur}) + G_{m}(T_s-T_\infty) - Q_{sun},\quad h_{conv} = (h_F^3 + h_N^3)^{1/3}$$
 * h_N: Churchill–Chu horizontal cylinder on D, or Churchill–Chu vertical plate on L with the
 * slenderness test; h_F: Churchill–Bernstein on D; h_r linearised radiation. Properties at
 * T_f = (T_s + T_∞)/2. End faces, when included, take the lateral coefficients (an approximation:
 * common practice, no source; they are D/(2L) of the lateral area, 7 % for a 50 × 350 mm body).
 * Mounts (G_m, fins: `mountConductance`) and a solar gain (`solarGain`) are optional and default to 0;
 * the gain enters as a negative loss, so Q is the net heat the body must be given to hold T_s.
 *
 * @param body geometry, emissivity, air; D, L (0, 10] m; V [0, 100] m/s; Tamb, Tsur in [200, 700] K;
 *   Gmount [0, 1e5] W/K; Qsun [0, 1e6] W
 * @param Ts surface temperature, K, [200, 700]
 * @returns coefficients, heat flows, UA, the dimensionless groups and validity warnings
 * @throws InputRangeError for inputs outside those ranges
 * @example bodyCooling({D:0.05,L:0.35,orientation:'horizontal',ends:false,eps:0.9,Tamb:298.15,V:0}, 353.15).Q // ≈ 41.0 W
 * @source incropera2007 eqs. 9.34, 9.26, 9.33, 7.54, 9.64, 1.9 (from memory)
 */
export function bodyCooling(body: Body, Ts: number): BodyCooling {
  const b = checkBody(body);
  requireInRange('Ts', Ts, BODY_T_RANGE, 'K');
  const warnings: string[] = [];
  return { ...coolingAt(b, Ts, warnings), warnings };
}

/**
 * Q(T_s) of `bodyCooling` as a function for an ODE or a root finder: the body is checked once, and
 * each call computes the same heat flow bit for bit without building the coefficients record or
 * its warnings (a warm-up run calls it up to millions of times).
 *
 * @example bodyHeatLoss({D:0.05,L:0.35,orientation:'horizontal',ends:false,eps:0.9,Tamb:298.15,V:0})(353.15) // ≈ 41.0 W, = bodyCooling(…, 353.15).Q
 * @throws InputRangeError for a bad body (at once) or T_s outside [200, 700] K (at the call)
 */
export function bodyHeatLoss(body: Body): (Ts: number) => number {
  const b = checkBody(body);
  return (Ts) => {
    requireInRange('Ts', Ts, BODY_T_RANGE, 'K');
    return coolingAt(b, Ts, undefined).Q;
  };
}

/** The body with its ranges checked and defaults filled. */
interface CheckedBody {
  readonly D: number; readonly L: number; readonly V: number; readonly Tamb: number; readonly Tsur: number;
  readonly Gmount: number; readonly Qsun: number; readonly eps: number; readonly orientation: Orientation; readonly ends: boolean;
}

function checkBody(body: Body): CheckedBody {
  const D = requireInRange('D', body.D, { ...POSITIVE, max: 10 }, 'm');
  const L = requireInRange('L', body.L, { ...POSITIVE, max: 10 }, 'm');
  const V = requireInRange('V', body.V, { min: 0, max: 100 }, 'm/s');
  const Tamb = requireInRange('Tamb', body.Tamb, BODY_T_RANGE, 'K');
  const Tsur = requireInRange('Tsur', body.Tsur ?? Tamb, BODY_T_RANGE, 'K');
  const Gmount = requireInRange('Gmount', body.Gmount ?? 0, { min: 0, max: 1e5 }, 'W/K');
  const Qsun = requireInRange('Qsun', body.Qsun ?? 0, { min: 0, max: 1e6 }, 'W');
  return { D, L, V, Tamb, Tsur, Gmount, Qsun, eps: body.eps, orientation: body.orientation, ends: body.ends };
}

/** The correlations at one surface temperature; validity warnings go to `warnings` when given. */
function coolingAt(b: CheckedBody, Ts: number, warnings: string[] | undefined): Omit<BodyCooling, 'warnings'> {
  const { D, L, V, Tamb, Tsur, Gmount, Qsun } = b;
  const Tfilm = 0.5 * (Ts + Tamb);
  const air = airProperties(Tfilm);
  const dT = Math.abs(Ts - Tamb);

  let hNatural: number;
  let Ra: number;
  if (b.orientation === 'horizontal') {
    Ra = rayleighNumber(air, dT, D).Ra;
    hNatural = (churchillChuCylinder(Ra, air.Pr) * air.k) / D;
    if (warnings && Ra > CHURCHILL_CHU_CYLINDER_RA_MAX) warnings.push(`Ra_D = ${Ra.toExponential(2)} is above 10¹², the range of the horizontal-cylinder correlation.`);
  } else {
    const g = rayleighNumber(air, dT, L);
    Ra = g.Ra;
    hNatural = (verticalPlateNusselt(Ra, air.Pr) * air.k) / L;
    if (warnings && dT > 0) {
      const s = verticalCylinderSlenderness(D, L, g.Gr);
      if (!s.ok) {
        warnings.push(`Vertical body too slender for the vertical-plate correlation: D = ${fmtMm(D)} < 35·L/Gr_L^¼ = ${fmtMm(s.Dmin)}. ` +
          'A slender cylinder sheds more heat than a plate, so h_N is underestimated (conservative for temperature).');
      }
    }
  }

  const Re = (V * D) / air.nu;
  const hForced = V > 0 ? (churchillBernstein(Re, air.Pr) * air.k) / D : 0;
  if (warnings && V > 0 && Re * air.Pr < CHURCHILL_BERNSTEIN_REPR_MIN) warnings.push(`Re·Pr = ${(Re * air.Pr).toPrecision(2)} is below 0.2, the range of the cross-flow correlation (free convection dominates here).`);
  if (warnings && Re > 1e7) warnings.push(`Re_D = ${Re.toExponential(2)} is beyond the data behind the cross-flow correlation (about 10⁷).`);
  const hConv = V > 0 ? mixedConvection(hForced, hNatural) : hNatural;
  const hRad = radiationCoefficient(b.eps, Ts, Tsur);

  const lateral = Math.PI * D * L;
  const area = b.ends ? lateral + 2 * (Math.PI / 4) * D * D : lateral;
  const Qconv = hConv * area * (Ts - Tamb);
  const Qrad = hRad * area * (Ts - Tsur);
  const Qmount = Gmount * (Ts - Tamb);
  // written so that with no mounts and no sun Q and UA are bit-for-bit the one-path values
  const Q = Gmount === 0 && Qsun === 0 ? Qconv + Qrad : Qconv + Qrad + Qmount - Qsun;
  const UA = (hConv + hRad) * area + Gmount;
  return { area, Tfilm, hNatural, hForced, hConv, hRad, Qconv, Qrad, Qmount, Qsun, Q, UA, Ra, Re, Pr: air.Pr };
}

function fmtMm(x: number): string {
  return Number.isFinite(x) ? `${(x * 1000).toPrecision(3)} mm` : '∞';
}

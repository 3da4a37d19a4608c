/**
 * Variance from a one-sided PSD by quadrature on a logarithmic frequency axis, with power-law
 * tails beyond the band added analytically and reported as the error bound.
 */
import { ComputationError } from '../errors.ts';
import { adaptiveSimpson, adaptiveSimpsonVector } from '../numeric/index.ts';

export interface SpectralIntegral {
  /** ∫₀^∞ G(f) df including the tail estimates. */
  readonly value: number;
  /** Quadrature band, Hz. */
  readonly band: readonly [number, number];
  /** Part of `value` from the two tail estimates (relative). */
  readonly tailFraction: number;
  /** Error bound (relative): quadrature tolerance + 10 % of the tails. */
  readonly relError: number;
  /** How the value was found: this quadrature, or a closed form by residues (quarterCarRandom). */
  readonly method?: 'quadrature' | 'residues';
}

/**
 * Equal log panels plus, around each expected peak, edges at relative offsets ±10⁻¹⁰ … ±0.2 (a factor
 * 5 apart), so a resonance narrower than a panel is bracketed whatever its damping.
 */
function panelEdges(u1: number, u2: number, panels: number, peaks: readonly number[]): number[] {
  const inner: number[] = [];
  for (let i = 1; i < panels; i++) inner.push(u1 + ((u2 - u1) * i) / panels);
  for (const p of peaks) {
    const up = Math.log(p);
    inner.push(up);
    for (let d = 1e-10; d < 0.4; d *= 5) inner.push(up + Math.log1p(d), up - Math.log1p(d));
  }
  const e = [u1, ...inner.filter((x) => x > u1 && x < u2).sort((a, b) => a - b), u2];
  return e.filter((x, i) => i === 0 || x - e[i - 1]! > 1e-12 * (1 + Math.abs(x)));
}

/** Local log-log slope of g at f (central difference over a factor 1.01). */
function slope(g: (f: number) => number, f: number): number {
  const h = 0.01;
  const up = g(f * Math.exp(h));
  const dn = g(f * Math.exp(-h));
  return up > 0 && dn > 0 ? (Math.log(up) - Math.log(dn)) / (2 * h) : 0;
}

/**
 * Integrates a one-sided PSD over all frequencies.
 *
 * $$\sigma^2 = \int_0^\infty G(f)\,df = \int_{\ln f_1}^{\ln f_2} G(e^u)\,e^u\,du
 *   + \frac{G(f_1) f_1}{p_1 + 1} + \frac{G(f_2) f_2}{q_2 - 1}$$
 * with G ∝ f^{p₁} below f₁ and G ∝ f^{−q₂} above f₂ (slopes measured at the band edges).
 * The band is split into `panels` equal log panels, each integrated by adaptive Simpson, so a
 * narrow resonance cannot hide between the first samples.
 *
 * @param g one-sided PSD, ≥ 0 and finite on [f1, f2]
 * @param f1 lower band edge, Hz, > 0
 * @param f2 upper band edge, Hz, > f1
 * @param relTol relative tolerance of the quadrature, default 1e-9
 * @param panels number of equal log panels, default 120
 * @param peaks frequencies (Hz) of expected narrow peaks, bracketed by extra panel edges
 * @param maxDepth recursion limit of adaptive Simpson in each panel (bounds the work), default 10
 * @throws ComputationError when a tail does not decay (the variance is infinite)
 * @example spectralIntegral((f) => 1 / (1 + f * f), 1e-4, 1e4).value // 1.570796 (π/2 less the tails beyond the band, 1e-4 each)
 * @source lyness1969 (adaptive Simpson); tails: closed form of ∫ f^p df
 */
export function spectralIntegral(g: (f: number) => number, f1: number, f2: number, relTol = 1e-9, panels = 120, peaks: readonly number[] = [], maxDepth = 10): SpectralIntegral {
  const u1 = Math.log(f1);
  const u2 = Math.log(f2);
  const h = (u2 - u1) / panels;
  const edges = panelEdges(u1, u2, panels, peaks);
  const gu = (u: number): number => {
    const f = Math.exp(u);
    return g(f) * f;
  };
  // Coarse pass sets the absolute tolerance scale.
  let coarse = 0;
  for (let i = 0; i <= 8 * panels; i++) coarse += gu(u1 + (i * h) / 8) * (i === 0 || i === 8 * panels ? 0.5 : 1);
  coarse *= h / 8;
  if (!(coarse > 0) || !Number.isFinite(coarse)) throw new ComputationError('spectral integral: the PSD is zero or not finite on the band');
  const absTol = (relTol * coarse) / edges.length;
  let band = 0;
  // the depth limit bounds the work; narrow peaks are caught by the panel edges placed around them
  for (let i = 0; i + 1 < edges.length; i++) band += adaptiveSimpson(gu, edges[i]!, edges[i + 1]!, absTol, maxDepth);
  const p1 = slope(g, f1);
  const q2 = -slope(g, f2);
  if (p1 <= -1 || q2 <= 1) throw new ComputationError(`spectral integral: the PSD does not decay fast enough outside ${f1.toPrecision(3)}–${f2.toPrecision(3)} Hz (variance unbounded)`);
  const tails = (g(f1) * f1) / (p1 + 1) + (g(f2) * f2) / (q2 - 1);
  const value = band + tails;
  return { value, band: [f1, f2], tailFraction: tails / value, relError: relTol + (0.1 * tails) / value, method: 'quadrature' };
}

/**
 * Several one-sided PSDs integrated together on the same points (one call of `g` per frequency
 * gives them all), each with its own tolerance, tails and error statement: the rule of
 * spectralIntegral applied per component (see there).
 *
 * @param g the PSDs at f, an array of fixed length, each ≥ 0 and finite on [f1, f2]
 * @param f1 lower band edge, Hz, > 0; f2 upper band edge, Hz, > f1
 * @param relTol relative tolerance of each quadrature; panels, peaks, maxDepth as for spectralIntegral
 * @throws ComputationError when a component is zero on the band or a tail does not decay
 * @example spectralIntegrals((f) => [1 / (1 + f * f), 1 / (1 + f * f) ** 2], 1e-4, 1e4).map((r) => r.value) // [1.570796, 0.785398]
 * @source lyness1969 (adaptive Simpson); tails: closed form of ∫ f^p df
 */
export function spectralIntegrals(g: (f: number) => readonly number[], f1: number, f2: number, relTol = 1e-9, panels = 120, peaks: readonly number[] = [], maxDepth = 10): SpectralIntegral[] {
  const u1 = Math.log(f1);
  const u2 = Math.log(f2);
  const h = (u2 - u1) / panels;
  const edges = panelEdges(u1, u2, panels, peaks);
  const gu = (u: number): number[] => {
    const f = Math.exp(u);
    return g(f).map((x) => x * f);
  };
  const n = g(f1).length;
  const coarse = new Array<number>(n).fill(0);
  for (let i = 0; i <= 8 * panels; i++) {
    const w = i === 0 || i === 8 * panels ? 0.5 : 1;
    gu(u1 + (i * h) / 8).forEach((x, k) => { coarse[k] = coarse[k]! + w * x; });
  }
  const absTol = coarse.map((c) => {
    if (!(c > 0) || !Number.isFinite(c)) throw new ComputationError('spectral integral: the PSD is zero or not finite on the band');
    return (relTol * c * h) / 8 / edges.length;
  });
  const band = new Array<number>(n).fill(0);
  for (let i = 0; i + 1 < edges.length; i++) adaptiveSimpsonVector(gu, edges[i]!, edges[i + 1]!, absTol, maxDepth).forEach((x, k) => { band[k] = band[k]! + x; });
  return band.map((b, k) => {
    const gk = (f: number) => g(f)[k]!;
    const p1 = slope(gk, f1);
    const q2 = -slope(gk, f2);
    if (p1 <= -1 || q2 <= 1) throw new ComputationError(`spectral integral: the PSD does not decay fast enough outside ${f1.toPrecision(3)}–${f2.toPrecision(3)} Hz (variance unbounded)`);
    const tails = (gk(f1) * f1) / (p1 + 1) + (gk(f2) * f2) / (q2 - 1);
    const value = b + tails;
    return { value, band: [f1, f2] as const, tailFraction: tails / value, relError: relTol + (0.1 * tails) / value, method: 'quadrature' as const };
  });
}

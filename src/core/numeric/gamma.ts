/**
 * The Gamma function Γ(x) for real x > 0, by the Lanczos approximation (g = 7, nine
 * coefficients), with the reflection formula below x = 0.5.
 *
 * $$\Gamma(z+1) = \sqrt{2\pi}\,(z+g+\tfrac12)^{z+1/2} e^{-(z+g+1/2)} A_g(z)$$
 *
 * Relative error about 1e-15 over the positive axis (checked in tests against exact values
 * Γ(n) = (n−1)! and Γ(½) = √π).
 *
 * @param x argument, (0, 171); larger values overflow a double
 * @example gamma(0.5) // 1.7724538509055159 (√π)
 * @source lanczos1964 (method); press2007 §6.1 (coefficient set, from memory)
 */
export function gamma(x: number): number {
  if (!(x > 0) || x >= 171.6) throw new RangeError(`gamma: argument ${x} outside (0, 171.6)`);
  if (x < 0.5) return Math.PI / (Math.sin(Math.PI * x) * gamma(1 - x));
  const z = x - 1;
  let a = C[0]!;
  const t = z + G + 0.5;
  for (let i = 1; i < C.length; i++) a += C[i]! / (z + i);
  return Math.sqrt(2 * Math.PI) * Math.pow(t, z + 0.5) * Math.exp(-t) * a;
}

const G = 7;
const C = [
  0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313, -176.61502916214059,
  12.507343278686905, -0.13857109526572012, 9.9843695780195716e-6, 1.5056327351493116e-7,
] as const;

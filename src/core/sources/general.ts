import type { Source } from './source.ts';

export const general = {
  nist811: { kind: 'standard', citation: 'A. Thompson and B. N. Taylor, Guide for the Use of the International System of Units (SI), NIST Special Publication 811, 2008 ed., Appendix B.' },
  nist330: { kind: 'standard', citation: 'D. B. Newell and E. Tiesinga (eds.), The International System of Units (SI), NIST Special Publication 330, 2019 ed. (US edition of the BIPM SI Brochure, 9th ed.).' },
  codata2018: { kind: 'data', citation: 'E. Tiesinga et al., CODATA Recommended Values of the Fundamental Physical Constants: 2018, Rev. Mod. Phys. 93, 025010 (2021).' },
  lyness1969: { kind: 'paper', citation: 'J. N. Lyness, Notes on the adaptive Simpson quadrature routine, J. ACM 16(3), 483–495, 1969.' },
  lanczos1964: { kind: 'paper', citation: 'C. Lanczos, A precision approximation of the gamma function, SIAM J. Numer. Anal. Ser. B 1, 86–96, 1964.' },
  abramowitz1964: { kind: 'book', citation: 'M. Abramowitz and I. A. Stegun, Handbook of Mathematical Functions, NBS Applied Mathematics Series 55, 1964.' },
  aberth1973: { kind: 'paper', citation: 'O. Aberth, Iteration methods for finding all zeros of a polynomial simultaneously, Math. Comp. 27(122), 339–344, 1973.' },
  bini1996: { kind: 'paper', citation: 'D. A. Bini, Numerical computation of polynomial zeros by means of Aberth\'s method, Numer. Algorithms 13, 179–200, 1996.' },
  gradshteyn2007: { kind: 'book', citation: 'I. S. Gradshteyn and I. M. Ryzhik, Table of Integrals, Series, and Products, 7th ed. (A. Jeffrey and D. Zwillinger, eds.), Academic Press, 2007.' },
  flajolet1995: { kind: 'paper', citation: 'P. Flajolet, X. Gourdon and P. Dumas, Mellin transforms and asymptotics: harmonic sums, Theoret. Comput. Sci. 144, 3–58, 1995.' },
  dekker1971: { kind: 'paper', citation: 'T. J. Dekker, A floating-point technique for extending the available precision, Numer. Math. 18, 224–242, 1971.' },
} as const satisfies Record<string, Source>;

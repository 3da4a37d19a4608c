import type { Source } from './source.ts';

export const general = {
  nist811: { kind: 'standard', citation: 'A. Thompson and B. N. Taylor, Guide for the Use of the International System of Units (SI), NIST Special Publication 811, 2008 ed., Appendix B.' },
  nist330: { kind: 'standard', citation: 'D. B. Newell and E. Tiesinga (eds.), The International System of Units (SI), NIST Special Publication 330, 2019 ed. (US edition of the BIPM SI Brochure, 9th ed.).' },
  codata2018: { kind: 'data', citation: 'E. Tiesinga et al., CODATA Recommended Values of the Fundamental Physical Constants: 2018, Rev. Mod. Phys. 93, 025010 (2021).' },
  lyness1969: { kind: 'paper', citation: 'J. N. Lyness, Notes on the adaptive Simpson quadrature routine, J. ACM 16(3), 483–495, 1969.' },
  lanczos1964: { kind: 'paper', citation: 'C. Lanczos, A precision approximation of the gamma function, SIAM J. Numer. Anal. Ser. B 1, 86–96, 1964.' },
  abramowitz1964: { kind: 'book', citation: 'M. Abramowitz and I. A. Stegun, Handbook of Mathematical Functions, NBS Applied Mathematics Series 55, 1964.' },
} as const satisfies Record<string, Source>;

import type { Source } from './source.ts';

export const vibration = {
  rao2017: { kind: 'book', citation: 'S. S. Rao, Mechanical Vibrations, 6th ed., Pearson, 2017.' },
  inman2014: { kind: 'book', citation: 'D. J. Inman, Engineering Vibration, 4th ed., Pearson, 2014.' },
  chopra2017: { kind: 'book', citation: 'A. K. Chopra, Dynamics of Structures, 5th ed., Pearson, 2017.' },
  denHartog1956: { kind: 'book', citation: 'J. P. Den Hartog, Mechanical Vibrations, 4th ed., McGraw-Hill, 1956.' },
  thomson1998: { kind: 'book', citation: 'W. T. Thomson and M. D. Dahleh, Theory of Vibration with Applications, 5th ed., Prentice Hall, 1998.' },
  hairer1993: { kind: 'book', citation: 'E. Hairer, S. P. Nørsett and G. Wanner, Solving Ordinary Differential Equations I: Nonstiff Problems, 2nd ed., Springer, 1993.' },
  dormand1980: { kind: 'paper', citation: 'J. R. Dormand and P. J. Prince, A family of embedded Runge–Kutta formulae, J. Comput. Appl. Math. 6(1), 19–26, 1980.' },
} as const satisfies Record<string, Source>;

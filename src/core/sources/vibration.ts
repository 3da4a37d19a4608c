import type { Source } from './source.ts';

export const vibration = {
  rao2017: { kind: 'book', citation: 'S. S. Rao, Mechanical Vibrations, 6th ed., Pearson, 2017.' },
  inman2014: { kind: 'book', citation: 'D. J. Inman, Engineering Vibration, 4th ed., Pearson, 2014.' },
  chopra2017: { kind: 'book', citation: 'A. K. Chopra, Dynamics of Structures, 5th ed., Pearson, 2017.' },
  denHartog1956: { kind: 'book', citation: 'J. P. Den Hartog, Mechanical Vibrations, 4th ed., McGraw-Hill, 1956.' },
  thomson1998: { kind: 'book', citation: 'W. T. Thomson and M. D. Dahleh, Theory of Vibration with Applications, 5th ed., Prentice Hall, 1998.' },
  hairer1993: { kind: 'book', citation: 'E. Hairer, S. P. Nørsett and G. Wanner, Solving Ordinary Differential Equations I: Nonstiff Problems, 2nd ed., Springer, 1993.' },
  dormand1980: { kind: 'paper', citation: 'J. R. Dormand and P. J. Prince, A family of embedded Runge–Kutta formulae, J. Comput. Appl. Math. 6(1), 19–26, 1980.' },
  smith1962: { kind: 'paper', citation: 'R. L. Smith, Algorithm 116: Complex division, Commun. ACM 5(8), 435, 1962.' },
  warburton1982: { kind: 'paper', citation: 'G. B. Warburton, Optimum absorber parameters for various combinations of response and excitation parameters, Earthq. Eng. Struct. Dyn. 10(3), 381–401, 1982.' },
  brock1946: { kind: 'paper', citation: 'J. E. Brock, A note on the damped vibration absorber, J. Appl. Mech. 13, A284, 1946.' },
  ewins2000: { kind: 'book', citation: 'D. J. Ewins, Modal Testing: Theory, Practice and Application, 2nd ed., Research Studies Press, 2000.' },
  press2007: { kind: 'book', citation: 'W. H. Press, S. A. Teukolsky, W. T. Vetterling and B. P. Flannery, Numerical Recipes: The Art of Scientific Computing, 3rd ed., Cambridge University Press, 2007.' },
  golub1973: { kind: 'paper', citation: 'G. H. Golub and V. Pereyra, The differentiation of pseudo-inverses and nonlinear least squares problems whose variables separate, SIAM J. Numer. Anal. 10(2), 413–432, 1973.' },
} as const satisfies Record<string, Source>;

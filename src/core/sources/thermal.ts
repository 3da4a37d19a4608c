import type { Source } from './source.ts';

export const thermal = {
  incropera2007: { kind: 'book', citation: 'F. P. Incropera, D. P. DeWitt, T. L. Bergman and A. S. Lavine, Fundamentals of Heat and Mass Transfer, 6th ed., Wiley, 2007.' },
  churchillChu1975: { kind: 'paper', citation: 'S. W. Churchill and H. H. S. Chu, Correlating equations for laminar and turbulent free convection from a horizontal cylinder, Int. J. Heat Mass Transfer 18(9), 1049–1053, 1975.' },
  churchillChu1975plate: { kind: 'paper', citation: 'S. W. Churchill and H. H. S. Chu, Correlating equations for laminar and turbulent free convection from a vertical plate, Int. J. Heat Mass Transfer 18(11), 1323–1329, 1975.' },
  churchillBernstein1977: { kind: 'paper', citation: 'S. W. Churchill and M. Bernstein, A correlating equation for forced convection from gases and liquids to a circular cylinder in crossflow, J. Heat Transfer 99(2), 300–306, 1977.' },
  churchill1977mixed: { kind: 'paper', citation: 'S. W. Churchill, A comprehensive correlating equation for laminar, assisting, forced and free convection, AIChE J. 23(1), 10–16, 1977.' },
  astmD341: { kind: 'standard', citation: 'ASTM D341, Standard Practice for Viscosity–Temperature Equations and Charts for Liquid Petroleum or Hydrocarbon Products, ASTM International.' },
  iso3448: { kind: 'standard', citation: 'ISO 3448:1992, Industrial liquid lubricants — ISO viscosity classification, ISO.' },
  astmD2270: { kind: 'standard', citation: 'ASTM D2270, Standard Practice for Calculating Viscosity Index from Kinematic Viscosity at 40 °C and 100 °C, ASTM International.' },
  brent1973: { kind: 'book', citation: 'R. P. Brent, Algorithms for Minimization without Derivatives, Prentice-Hall, 1973.' },
  dixon2007thermal: { kind: 'book', citation: 'J. C. Dixon, The Shock Absorber Handbook, 2nd ed., Wiley, 2007 (chapter on temperature and fade).' },
  andrade1930: { kind: 'paper', citation: 'E. N. da C. Andrade, The viscosity of liquids, Nature 125, 309–310, 1930.' },
  apiMpms11_1: { kind: 'standard', citation: 'API MPMS Chapter 11.1 (ASTM D1250, IP 200), Temperature and Pressure Volume Correction Factors for Generalized Crude Oils, Refined Products and Lubricating Oils, American Petroleum Institute, 2004.' },
  hryciow2022: { kind: 'paper', citation: 'Z. Hryciów, bench tests of twin-tube shock absorbers over a range of temperatures, Applied Sciences 12(24), 12765, 2022 (MDPI).' },
  lawson1974: { kind: 'book', citation: 'C. L. Lawson and R. J. Hanson, Solving Least Squares Problems, Prentice-Hall, 1974.' },
  iso11346: { kind: 'standard', citation: 'ISO 11346:2014, Rubber, vulcanized or thermoplastic — Estimation of life-time and maximum temperature of use, 3rd ed., ISO.' },
  miner1945: { kind: 'paper', citation: 'M. A. Miner, Cumulative damage in fatigue, J. Appl. Mech. 12(3), A159–A164, 1945.' },
  cengel2015: { kind: 'book', citation: 'Y. A. Çengel and M. A. Boles, Thermodynamics: An Engineering Approach, 8th ed., McGraw-Hill Education, 2015.' },
} as const satisfies Record<string, Source>;

import type { Source } from './source.ts';

export const duty = {
  dixon2007: { kind: 'book', citation: 'J. C. Dixon, The Shock Absorber Handbook, 2nd ed., Wiley, 2007.' },
  fema356: { kind: 'report', citation: 'FEMA 356, Prestandard and Commentary for the Seismic Rehabilitation of Buildings, Federal Emergency Management Agency, 2000.' },
  christopoulos2006: { kind: 'book', citation: 'C. Christopoulos and A. Filiatrault, Principles of Passive Supplemental Damping and Seismic Isolation, IUSS Press, Pavia, 2006.' },
  lakes2009: { kind: 'book', citation: 'R. Lakes, Viscoelastic Materials, Cambridge University Press, 2009.' },
  fema274: { kind: 'report', citation: 'FEMA 274, NEHRP Commentary on the Guidelines for the Seismic Rehabilitation of Buildings, Federal Emergency Management Agency, 1997.' },
  iso8608: { kind: 'standard', citation: 'ISO 8608:2016, Mechanical vibration — Road surface profiles — Reporting of measured data, 2nd ed., International Organization for Standardization, 2016.' },
  iso2631_1: { kind: 'standard', citation: 'ISO 2631-1:1997, Mechanical vibration and shock — Evaluation of human exposure to whole-body vibration — Part 1: General requirements, 2nd ed., International Organization for Standardization, 1997.' },
  wong2008: { kind: 'book', citation: 'J. Y. Wong, Theory of Ground Vehicles, 4th ed., Wiley, 2008.' },
  zuo2013: { kind: 'paper', citation: 'L. Zuo and P.-S. Zhang, Energy harvesting, ride comfort, and road handling of regenerative vehicle suspensions, J. Vib. Acoust. 135(1), 011002, 2013.' },
  gobbi2001: { kind: 'paper', citation: 'M. Gobbi and G. Mastinu, Analytical description and optimization of the dynamic behaviour of passively suspended road vehicles, J. Sound Vib. 245(3), 457–481, 2001.' },
  newland1993: { kind: 'book', citation: 'D. E. Newland, An Introduction to Random Vibration, Spectral and Wavelet Analysis, 3rd ed., Longman, 1993.' },
  roberts2003: { kind: 'book', citation: 'J. B. Roberts and P. D. Spanos, Random Vibration and Statistical Linearization, Dover ed., 2003 (Wiley, 1990).' },
  asce41_17: { kind: 'standard', citation: 'ASCE/SEI 41-17, Seismic Evaluation and Retrofit of Existing Buildings, American Society of Civil Engineers, 2017.' },
  soong1997: { kind: 'book', citation: 'T. T. Soong and G. F. Dargush, Passive Energy Dissipation Systems in Structural Engineering, Wiley, 1997.' },
  meriam2012: { kind: 'book', citation: 'J. L. Meriam and L. G. Kraige, Engineering Mechanics: Dynamics, 7th ed., Wiley, 2012.' },
  asce7_16: { kind: 'standard', citation: 'ASCE/SEI 7-16, Minimum Design Loads and Associated Criteria for Buildings and Other Structures, American Society of Civil Engineers, 2017.' },
  en1998_1: { kind: 'standard', citation: 'EN 1998-1:2004, Eurocode 8: Design of structures for earthquake resistance — Part 1: General rules, seismic actions and rules for buildings, CEN, 2004.' },
  rice1944: { kind: 'paper', citation: 'S. O. Rice, Mathematical analysis of random noise, Bell System Technical Journal 23(3), 282–332, 1944, and 24(1), 46–156, 1945.' },
  fornberg1988: { kind: 'paper', citation: 'B. Fornberg, Generation of finite difference formulas on arbitrarily spaced grids, Math. Comp. 51(184), 699–706, 1988.' },
} as const satisfies Record<string, Source>;

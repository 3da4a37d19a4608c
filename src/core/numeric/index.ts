/** Numerical building blocks shared by every domain. */
export { adaptiveSimpson } from './adaptiveSimpson.ts';
export { adaptiveSimpsonVector } from './adaptiveSimpsonVector.ts';
export { gaussLegendre } from './gaussLegendre.ts';
export { gamma } from './gamma.ts';
export { brentRoot, type BrentOptions } from './brent.ts';
export { bracketRoots, type Crossing } from './bracketRoots.ts';
export { DECIMAL_COMMA, PLAIN_NUMBER, hasDecimalComma, isPlainNumber } from './plainNumber.ts';
export { goldenSection, type GoldenMinimum } from './goldenSection.ts';
export { relativeDifference, withinTolerance } from './compare.ts';
export { maxOf, minOf, maxAbsOf } from './extent.ts';
export { polynomialRoots, type PolynomialRoot } from './polynomialRoots.ts';
export { mellinRational, type MellinValue, type RationalSpectrum } from './mellinRational.ts';
export { ddAdd, ddMul, ddProduct, refineRoot, type DD } from './doubleDouble.ts';

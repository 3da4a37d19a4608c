/** Complex arithmetic for phasors and frequency responses. */
export { abs, add, arg, complex, div, exp, expm1, log, mul, scale, sub, type Complex } from './complex.ts';

/** Complex arithmetic for phasors and frequency responses. */
export { abs, add, arg, complex, div, mul, scale, sub, type Complex } from './complex.ts';

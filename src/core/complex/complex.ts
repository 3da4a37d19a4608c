/**
 * A tiny complex arithmetic kit for frequency responses (phasors). Values are plain immutable
 * objects; every operation returns a new value. Division by zero throws instead of giving NaN.
 */
import { ComputationError } from '../errors.ts';

export interface Complex {
  readonly re: number;
  readonly im: number;
}

/**
 * Builds re + i·im.
 * @example abs(div(complex(5, 5), complex(3, -1))) // 2.236068 (|1 + 2i| = √5)
 * @source common practice, no source (complex arithmetic; division after smith1962)
 */
export function complex(re: number, im = 0): Complex {
  return { re, im };
}

export function add(a: Complex, b: Complex): Complex {
  return { re: a.re + b.re, im: a.im + b.im };
}

export function sub(a: Complex, b: Complex): Complex {
  return { re: a.re - b.re, im: a.im - b.im };
}

export function mul(a: Complex, b: Complex): Complex {
  return { re: a.re * b.re - a.im * b.im, im: a.re * b.im + a.im * b.re };
}

/** Multiplies by a real number. */
export function scale(a: Complex, s: number): Complex {
  return { re: a.re * s, im: a.im * s };
}

/**
 * Quotient a / b by Smith's algorithm, which avoids overflow and underflow of |b|².
 * @throws ComputationError when b = 0
 * @source smith1962 (Algorithm 116)
 */
export function div(a: Complex, b: Complex): Complex {
  if (b.re === 0 && b.im === 0) throw new ComputationError('complex division by zero');
  if (Math.abs(b.re) >= Math.abs(b.im)) {
    const r = b.im / b.re;
    const d = b.re + b.im * r;
    return { re: (a.re + a.im * r) / d, im: (a.im - a.re * r) / d };
  }
  const r = b.re / b.im;
  const d = b.re * r + b.im;
  return { re: (a.re * r + a.im) / d, im: (a.im * r - a.re) / d };
}

/** Modulus |a| (hypot, no overflow for large parts). */
export function abs(a: Complex): number {
  return Math.hypot(a.re, a.im);
}

/** Argument in (−π, π]. */
export function arg(a: Complex): number {
  return Math.atan2(a.im, a.re);
}

/**
 * Exponential e^a = e^{re}(cos im + i sin im).
 * @example exp(complex(0, Math.PI / 2)).im // 1
 * @source abramowitz1964 4.3.47 (from memory)
 */
export function exp(a: Complex): Complex {
  const m = Math.exp(a.re);
  return { re: m * Math.cos(a.im), im: m * Math.sin(a.im) };
}

/**
 * e^a − 1 without the cancellation of exp(a) − 1 when |a| is small: the real part is written as
 * expm1(re)·cos(im) − 2 sin²(im/2), both terms accurate to rounding.
 * @example expm1(complex(1e-12, 1e-12)).im // 1e-12
 * @source abramowitz1964 4.3.47 with the half-angle identity 4.3.20 (from memory)
 */
export function expm1(a: Complex): Complex {
  const h = Math.sin(a.im / 2);
  return { re: Math.expm1(a.re) * Math.cos(a.im) - 2 * h * h, im: Math.exp(a.re) * Math.sin(a.im) };
}

/**
 * Principal logarithm ln|a| + i arg a, arg in (−π, π] (the branch cut is the negative real axis).
 * @throws ComputationError when a = 0
 * @example log(complex(-1, 0)).im // 3.141593
 * @source abramowitz1964 4.1.2 (principal value; from memory)
 */
export function log(a: Complex): Complex {
  if (a.re === 0 && a.im === 0) throw new ComputationError('logarithm of zero');
  return { re: Math.log(Math.hypot(a.re, a.im)), im: Math.atan2(a.im, a.re) };
}

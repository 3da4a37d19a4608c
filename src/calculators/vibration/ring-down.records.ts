/**
 * Synthetic ring-down records for the ring-down calculator's default (the TW-077 test-bay demo)
 * and its verification cases. Deterministic: a seeded generator gives the same text every build.
 * These are data generators, not calculator logic.
 */

export interface RecordSpec {
  /** natural circular frequency, rad/s */ readonly wn: number;
  readonly zeta: number;
  /** initial amplitude and equilibrium offset, in the record's unit */ readonly amplitude: number;
  readonly offset: number;
  /** phase at the first sample, rad */ readonly phase: number;
  readonly cycles: number;
  readonly samplesPerCycle: number;
  /** Gaussian noise standard deviation, record unit */ readonly noise: number;
  /** timing jitter as a fraction of the nominal step, [0, 0.9] */ readonly jitter: number;
  readonly seed: number;
  readonly header: string;
  readonly delimiter: ',' | ';' | '\t';
  readonly digits: number;
}

/** Mulberry32: a small seeded uniform generator on [0, 1). */
export function seeded(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Standard normal deviate by the Box–Muller transform. */
export function normal(u: () => number): number {
  return Math.sqrt(-2 * Math.log(1 - u())) * Math.cos(2 * Math.PI * u());
}

/** y(t) = offset + A e^{−ζω_n t} cos(ω_d t + φ) + noise, on a jittered time grid, as CSV text. */
export function syntheticRingDown(s: RecordSpec): string {
  const u = seeded(s.seed);
  const wd = s.wn * Math.sqrt(1 - s.zeta * s.zeta);
  const step = (2 * Math.PI) / wd / s.samplesPerCycle;
  const n = Math.round(s.cycles * s.samplesPerCycle);
  const lines = [s.header];
  for (let i = 0; i < n; i++) {
    const t = i === 0 ? 0 : (i + s.jitter * (u() - 0.5)) * step;
    const y = s.offset + s.amplitude * Math.exp(-s.zeta * s.wn * t) * Math.cos(wd * t + s.phase) + s.noise * normal(u);
    lines.push(`${t.toFixed(5)}${s.delimiter}${y.toPrecision(s.digits)}`);
  }
  return lines.join('\n');
}

/** TW-077 instrument mount (10 kg on 4 kN/m, invented test): LVDT record in mm against s, semicolon export. */
export const DEMO_RECORD = syntheticRingDown({
  wn: 20, zeta: 0.035, amplitude: 3.0, offset: 1.2, phase: 0.4, cycles: 14, samplesPerCycle: 32,
  noise: 0.01, jitter: 0.3, seed: 77, header: '# TW-077 bay 2, mount M-4, LVDT ch1 (mm)\ntime_s;disp_mm', delimiter: ';', digits: 5,
});

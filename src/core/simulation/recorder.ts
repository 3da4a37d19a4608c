import type { AcceptedStep } from '../ode/index.ts';
import { stepPeaks } from './stepPeak.ts';

/** Evenly sampled history (for charts), SI. */
export interface SimulationHistory {
  readonly t: number[];
  readonly x: number[]; // relative displacement z, m
  readonly v: number[]; // m/s
  readonly force: number[]; // damper force, N
  readonly stored: number[]; // kinetic + spring, J
  readonly dissipated: number[]; // J
  readonly input: number[]; // J
}

/** State layout of the simulated system: z, ż, E_D, W, and the damper's own displacement x_d with a series spring. */
export const Z = 0, V = 1, ED = 2, W = 3, XD = 4;

/**
 * Watches a simulation step by step: keeps the energy-audit residual
 * |½mż² + ½kz² + E_D − W − E_0| and the peaks, and fills an evenly spaced history from the
 * integrator's dense output. The residual is audited at each step end and at θ = ¼, ½, ¾ inside
 * it; the peaks of |ż|, |F_d|, the stored energy and |W| are located on the dense output
 * (stepPeak), and |z|max at every velocity reversal (bisection), so every peak is exact to the
 * integration tolerance rather than to the sampling.
 */
export class RunRecorder {
  readonly history: SimulationHistory = { t: [], x: [], v: [], force: [], stored: [], dissipated: [], input: [] };
  residual = 0;
  maxStored: number;
  maxInput = 0;
  xMax = 0;
  vMax = 0;
  forceMax = 0;
  xLast = 0;
  edAtLastFrom = 0;
  private next = 0;
  // the dense output fills as many components as the buffer has: sized to the state (4, or 5 with a series spring)
  private tmp = new Float64Array(4);
  /** States at θ = ¼, ½, ¾ of the current step (audited, then searched for peaks). */
  private quarter = [new Float64Array(4), new Float64Array(4), new Float64Array(4)];
  private readonly peaks = new Float64Array(4);
  /** The peaks located on the dense output: |ż|, |F_d|, stored energy, |W|. */
  private readonly watched = (t: number, y: ArrayLike<number>, out: Float64Array, o: number): void => {
    out[o] = Math.abs(y[V]!);
    out[o + 1] = Math.abs(this.forceAt(t, y));
    out[o + 2] = 0.5 * this.m * y[V]! ** 2 + 0.5 * this.k * y[Z]! ** 2 + this.extraStored(y);
    out[o + 3] = Math.abs(y[W]!);
  };

  constructor(
    private readonly m: number, private readonly k: number, readonly E0: number,
    private readonly tEnd: number, private readonly samples: number, readonly tLastFrom: number,
    private readonly forceAt: (t: number, y: ArrayLike<number>) => number,
    /** Energy stored besides ½mż² + ½kz² (a series spring), J. */
    private readonly extraStored: (y: ArrayLike<number>) => number = () => 0,
  ) {
    this.maxStored = E0;
  }

  private sampleTime(i: number): number {
    return i === this.samples - 1 ? this.tEnd : (this.tEnd * i) / (this.samples - 1);
  }

  private sample(t: number, y: ArrayLike<number>): void {
    const h = this.history;
    h.t.push(t); h.x.push(y[Z]!); h.v.push(y[V]!); h.force.push(this.forceAt(t, y));
    h.stored.push(0.5 * this.m * y[V]! ** 2 + 0.5 * this.k * y[Z]! ** 2 + this.extraStored(y)); h.dissipated.push(y[ED]!); h.input.push(y[W]!);
  }

  /** Audits one state. */
  audit(t: number, y: ArrayLike<number>): void {
    const stored = 0.5 * this.m * y[V]! ** 2 + 0.5 * this.k * y[Z]! ** 2 + this.extraStored(y);
    this.residual = Math.max(this.residual, Math.abs(stored + y[ED]! - y[W]! - this.E0));
    this.maxStored = Math.max(this.maxStored, stored);
    this.maxInput = Math.max(this.maxInput, Math.abs(y[W]!));
    this.xMax = Math.max(this.xMax, Math.abs(y[Z]!));
    this.vMax = Math.max(this.vMax, Math.abs(y[V]!));
    this.forceMax = Math.max(this.forceMax, Math.abs(this.forceAt(t, y)));
    if (t >= this.tLastFrom) this.xLast = Math.max(this.xLast, Math.abs(y[Z]!));
  }

  /** A constant state from the last recorded time up to t (a stuck mass). */
  hold(tFrom: number, t: number, y: ArrayLike<number>): void {
    if (tFrom <= this.tLastFrom && this.tLastFrom < t) this.edAtLastFrom = y[ED]!;
    while (this.next < this.samples && this.sampleTime(this.next) <= t) { this.sample(this.sampleTime(this.next), y); this.next++; }
    this.audit(t, y);
  }

  /** An accepted integrator step. */
  step(s: AcceptedStep): void {
    const h = s.t1 - s.t0;
    if (this.tmp.length !== s.y0.length) {
      this.tmp = new Float64Array(s.y0.length);
      this.quarter = this.quarter.map(() => new Float64Array(s.y0.length));
    }
    const tmp = this.tmp;
    const q = this.quarter;
    for (let i = 1; i <= 3; i++) { s.interpolate(0.25 * i, q[i - 1]!); this.audit(s.t0 + 0.25 * i * h, q[i - 1]!); }
    if (s.y0[V]! * s.y1[V]! < 0) {
      let lo = 0, hi = 1;
      for (let i = 0; i < 50; i++) {
        const mid = 0.5 * (lo + hi);
        s.interpolate(mid, tmp);
        if (tmp[V]! * s.y0[V]! > 0) lo = mid; else hi = mid;
      }
      s.interpolate(0.5 * (lo + hi), tmp);
      this.audit(s.t0 + 0.5 * (lo + hi) * h, tmp);
    }
    this.audit(s.t1, s.y1);
    const pk = this.peaks;
    pk[0] = this.vMax; pk[1] = this.forceMax; pk[2] = this.maxStored; pk[3] = this.maxInput;
    stepPeaks(s, this.watched, pk, [s.y0, q[0]!, q[1]!, q[2]!, s.y1], tmp);
    this.vMax = pk[0]!; this.forceMax = pk[1]!; this.maxStored = pk[2]!; this.maxInput = pk[3]!;
    if (s.t0 < this.tLastFrom && this.tLastFrom <= s.t1) { s.interpolate((this.tLastFrom - s.t0) / h, tmp); this.edAtLastFrom = tmp[ED]!; }
    while (this.next < this.samples && this.sampleTime(this.next) <= s.t1) {
      const ts = this.sampleTime(this.next);
      s.interpolate(h > 0 ? Math.min(1, Math.max(0, (ts - s.t0) / h)) : 1, tmp);
      this.sample(ts, tmp);
      this.next++;
    }
  }

  /** Fills samples left at the end (round-off at tEnd) with the final state. */
  finish(y: ArrayLike<number>): void {
    while (this.next < this.samples) { this.sample(this.sampleTime(this.next), y); this.next++; }
  }

  /** Records the initial state. */
  start(y: ArrayLike<number>): void {
    if (this.samples > 0) { this.sample(0, y); this.next = 1; }
    this.audit(0, y);
  }
}

/**
 * Timing of the damper simulation: 10 s of a 5 Hz oscillator (10 kg, ζ ≈ 5 % equivalent) for
 * every damper law and drive, at the default tolerance, through the core and through the
 * calculator (which also samples 801 chart points). Target: well under 50 ms per run in a browser.
 *
 *   npx tsx bench/simulation.bench.ts
 *
 * Not part of npm test: timings depend on the machine and its load.
 */
import type { DamperLaw } from '../src/core/dampers/index.ts';
import { simulateSdof, type Excitation } from '../src/core/simulation/index.ts';
import { damperSimulationCalculator } from '../src/calculators/vibration/damper-simulation.ts';
import { evaluate } from '../src/calculators/evaluate.ts';

const m = 10;
const wn = 2 * Math.PI * 5;
const k = m * wn * wn;
const c = 2 * 0.05 * Math.sqrt(k * m);
const X = 0.01;
const laws: [string, DamperLaw][] = [
  ['linear', { kind: 'linear', c }],
  ['power α=0.5', { kind: 'power', C: c * Math.sqrt(X * wn), alpha: 0.5 }],
  ['power α=0.3', { kind: 'power', C: c * Math.pow(X * wn, 0.7), alpha: 0.3 }],
  ['coulomb', { kind: 'coulomb', Ff: 0.02 * k * X }],
  ['bilinear', { kind: 'bilinear', rebound: { c1: 2 * c, c2: c / 2 }, compression: { c1: c, c2: c / 4 }, vknee: 0.1 }],
  ['hysteretic', { kind: 'hysteretic', eta: 0.1, k }],
];
const drives: [string, Excitation][] = [
  ['free', { kind: 'none' }],
  ['force 4 Hz', { kind: 'force', F0: 0.3 * k * X, omega: 2 * Math.PI * 4 }],
  ['base 6 Hz', { kind: 'base', Y: X / 2, omega: 2 * Math.PI * 6 }],
];

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

/** Median wall-clock and CPU milliseconds per run (CPU time is the steadier figure on a busy machine). */
function time(fn: () => void, runs = 15): { wall: number; cpu: number } {
  for (let i = 0; i < 3; i++) fn(); // warm-up (JIT)
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < runs; i++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    fn();
    wall.push(performance.now() - t0);
    const c = process.cpuUsage(c0);
    cpu.push((c.user + c.system) / 1000);
  }
  return { wall: median(wall), cpu: median(cpu) };
}

console.log('10 s of a 5 Hz oscillator, rtol 1e-9 (median of 15 runs after 3 warm-ups)');
console.log('law            drive        wall ms  cpu ms    steps  rejected  closure');
for (const [ln, law] of laws) {
  for (const [dn, excitation] of drives) {
    const model = { m, k, law, excitation, x0: X, v0: 0 };
    const r = simulateSdof(model, { duration: 10 });
    const ms = time(() => simulateSdof(model, { duration: 10 }));
    console.log(`${ln.padEnd(14)} ${dn.padEnd(11)} ${ms.wall.toFixed(2).padStart(7)} ${ms.cpu.toFixed(2).padStart(7)} ${String(r.stats.accepted).padStart(8)} ${String(r.stats.rejected).padStart(8)}  ${r.closure.toExponential(1)}`);
  }
}

const page = { law: 'linear', c, m, k, x0: X, v0: 0, excitation: 'base', Y: X / 2, fExc: 6, duration: 10, rtol: 1e-9 };
let n = 0;
// vary an input each call so the calculator's one-entry cache does not hide the work
const ms = time(() => { evaluate(damperSimulationCalculator, { ...page, x0: X * (1 + 1e-9 * n++) }); });
console.log(`calculator evaluate() incl. 801 chart samples, linear law on base motion: ${ms.wall.toFixed(2)} ms wall, ${ms.cpu.toFixed(2)} ms CPU`);
console.log(`load average ${(await import('node:os')).loadavg().map((x) => x.toFixed(1)).join(' ')} (timings inflate when the machine is busy)`);

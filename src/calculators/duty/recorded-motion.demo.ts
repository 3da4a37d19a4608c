/**
 * The demo dyno record of the TW-077 test bay (invented data): a damper stroked ±25 mm at 1.2 Hz
 * on the dynamometer, sampled at 100 Hz with a small deterministic ripple on the force.
 */
export function demoDynoRecord(): string {
  const rows = ['# TW-077 test bay, dyno record D-14 (demo data)', 'time [s],stroke [mm],force [N]'];
  const X = 0.025;
  const w = 2 * Math.PI * 1.2;
  for (let i = 0; i <= 300; i++) {
    const t = i / 100;
    const x = X * Math.sin(w * t);
    const v = X * w * Math.cos(w * t);
    const a = Math.abs(v);
    const mag = v >= 0 ? (a <= 0.1 ? 2500 * a : 250 + 1200 * (a - 0.1)) : (a <= 0.1 ? 1200 * a : 120 + 500 * (a - 0.1));
    const F = Math.sign(v) * mag + 6 * Math.sin(37 * t);
    rows.push(`${t.toFixed(2)},${(x * 1000).toFixed(3)},${F.toFixed(1)}`);
  }
  return rows.join('\n');
}

/**
 * A synthetic sinusoidal record x = X·sin(2πft) for verification cases: columns time [s] and
 * displacement [mm], velocity [m/s], and (txF) the force of a linear damper c·v [N]. Optional
 * deterministic jitter of the sample times (fraction of the nominal interval).
 */
export function sineRecord(o: { X: number; f: number; cycles: number; rate: number; columns: 'tx' | 'tv' | 'txF'; c?: number; jitter?: number }): string {
  const w = 2 * Math.PI * o.f;
  const n = Math.round((o.cycles * o.rate) / o.f);
  const head = o.columns === 'tx' ? 'time [s],x [mm]' : o.columns === 'tv' ? 'time [s],v [m/s]' : 'time [s],x [mm],force [N]';
  const rows = [head];
  for (let i = 0; i <= n; i++) {
    const j = o.jitter && i > 0 && i < n ? o.jitter * Math.sin(12.9898 * i) * 0.5 : 0;
    const t = (i + j) / o.rate;
    const x = o.X * Math.sin(w * t);
    const v = o.X * w * Math.cos(w * t);
    if (o.columns === 'tx') rows.push(`${t.toPrecision(12)},${(x * 1000).toPrecision(12)}`);
    else if (o.columns === 'tv') rows.push(`${t.toPrecision(12)},${v.toPrecision(12)}`);
    else rows.push(`${t.toPrecision(12)},${(x * 1000).toPrecision(12)},${((o.c ?? 1000) * v).toPrecision(12)}`);
  }
  return rows.join('\n');
}

/**
 * A synthetic loop record for verification cases: x = X·sin(2πft) through F = k·x + c·ẋ
 * (+ F_f·sgn ẋ), columns time [s], x [mm], force [N], an integer number of samples per cycle.
 */
export function kelvinVoigtRecord(o: { k: number; c: number; Ff?: number; X: number; f: number; cycles: number; perCycle: number }): string {
  const w = 2 * Math.PI * o.f;
  const rows = ['time [s],x [mm],force [N]'];
  for (let i = 0; i <= o.cycles * o.perCycle; i++) {
    const t = i / (o.perCycle * o.f);
    const x = o.X * Math.sin(w * t);
    const v = o.X * w * Math.cos(w * t);
    const F = o.k * x + o.c * v + (o.Ff ?? 0) * Math.sign(v);
    rows.push(`${t.toPrecision(15)},${(x * 1000).toPrecision(15)},${F.toPrecision(15)}`);
  }
  return rows.join('\n');
}

/**
 * The demo loop record of the TW-402 Hall C prototype test (invented data), run in the TW-077 test
 * bay: a fluid viscous brace damper F = k·x + C·sgn(v)|v|^α (C = 150 kN at 0.25 m/s, α = 0.4, a
 * small fluid stiffness k = 0.1 MN/m) stroked ±25 mm at 1 Hz for 5 cycles, 400 samples per cycle;
 * the damper warms, so C falls 2 % per cycle; a small deterministic ripple on the force.
 * Published as public/data/tw402-c3-loop.csv (test/calculators/duty/hallCLoop.test.ts keeps them equal).
 */
export function hallCLoopRecord(): string {
  const rows = ['# TW-402 Hall C brace damper C-3, prototype loop test in the TW-077 test bay (demo data)', 'time [s],stroke [mm],force [kN]'];
  const X = 0.025, f = 1, w = 2 * Math.PI * f, n = 5 * 400;
  for (let i = 0; i <= n; i++) {
    const t = i / 400;
    const x = X * Math.sin(w * t);
    const v = X * w * Math.cos(w * t);
    const C = 150e3 * (1 - 0.02 * t * f) / 0.25 ** 0.4;
    const F = 1e5 * x + C * Math.sign(v) * Math.abs(v) ** 0.4 + 300 * Math.sin(53 * t);
    rows.push(`${t.toFixed(4)},${(x * 1000).toFixed(4)},${(F / 1000).toFixed(4)}`);
  }
  return rows.join('\n') + '\n';
}
